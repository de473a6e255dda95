import type { Role } from '@/lib/auth/roles';

/** Roles that may open a scheme's parcels and letters at all; each request then checks that scheme (designer: their own; checker: one they check). */
export const LIAISON_READERS: readonly Role[] = ['liaison', 'admin', 'designer', 'checker'];
/** Only the landowner liaison officer changes the register, the template and the letters, and sends them. */
export const LIAISON_MANAGERS: readonly Role[] = ['liaison'];
