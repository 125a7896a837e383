import { roleLabels } from '../../shared/schemas/roles';
import { DEMO_PASSWORD, demoUsers } from './seed/demo-users';

/** The lines `npm start` and `npm run dev` print under the URL in demo mode. */
export function describeDemoSignIns(): string {
  const width = Math.max(...demoUsers.map((user) => roleLabels[user.role].length));
  const lines = demoUsers.map((user) => `  ${roleLabels[user.role].padEnd(width)}  ${user.email}`);
  return [`Demo sign-ins (password for all: ${DEMO_PASSWORD}):`, ...lines].join('\n');
}
