import type { Role } from '@/lib/auth/roles';

// Invented people of the invented Wendle Valley scenario. The passwords are public (README) and for the demo only.
export const DEMO_USERS: { role: Role; email: string; name: string; password: string; organisation: string }[] = [
  { role: 'designer', email: 'designer@sillmark.test', name: 'Ada Penhallow', password: 'wendle-designer-2026', organisation: 'Penhallow Water Engineering' },
  { role: 'checker', email: 'checker@sillmark.test', name: 'Tomas Greave', password: 'wendle-checker-2026', organisation: 'Greave & Lund Consulting' },
  { role: 'liaison', email: 'liaison@sillmark.test', name: 'Mina Oakcroft', password: 'wendle-liaison-2026', organisation: 'Wendle Valley Drainage Board' },
  { role: 'planning', email: 'planning@sillmark.test', name: 'Rafe Calloway', password: 'wendle-planning-2026', organisation: 'Harrowfield District Council' },
  { role: 'admin', email: 'admin@sillmark.test', name: 'Ines Marrable', password: 'wendle-admin-2026', organisation: 'Sillmark' },
];
