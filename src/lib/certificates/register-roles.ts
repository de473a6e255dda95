import type { Role } from '@/lib/auth/roles';

/** Who reads the certificate register: planning officers above all; designers see their own certificates on their revisions. */
export const REGISTER_ROLES: readonly Role[] = ['planning', 'admin', 'checker', 'liaison'];
