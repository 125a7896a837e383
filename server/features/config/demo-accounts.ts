import type { Role } from '../../../shared/schemas/roles';

/**
 * The demo sign-ins shown on the sign-in page in demo mode (issue 2). The seed
 * (scripts/lib/seed/demo-users.ts) creates the same four accounts with this password.
 */
export const DEMO_PASSWORD = 'quietlayer-demo';

export const DEMO_ACCOUNTS: readonly { email: string; role: Role }[] = [
  { email: 'admin@larkspur.example', role: 'administrator' },
  { email: 'engineer@larkspur.example', role: 'engineer' },
  { email: 'technician@larkspur.example', role: 'technician' },
  { email: 'reviewer@larkspur.example', role: 'reviewer' },
];
