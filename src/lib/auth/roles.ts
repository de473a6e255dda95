// Shared by client and server: role names, their words, and where each role's work starts.
export const ROLES = ['designer', 'checker', 'liaison', 'planning', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  designer: 'Designer',
  checker: 'Checker',
  liaison: 'Landowner liaison',
  planning: 'Planning officer',
  admin: 'Administrator',
};

export const ROLE_DUTIES: Record<Role, string> = {
  designer: 'Enters and sizes schemes, and submits revisions for independent check.',
  checker: 'Reviews revisions and countersigns them; never their own work.',
  liaison: 'Keeps the parcels register and sends impact letters to landowners.',
  planning: 'Reads certified schemes, downloads and verifies certificates.',
  admin: 'Invites users, assigns roles and reads the audit trail.',
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
