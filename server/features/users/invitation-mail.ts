import type { OutgoingMail } from '../../mail/enqueue-mail';
import { roleLabels, type Role } from '../../../shared/schemas/roles';

/** The invitation message: who invited whom, as what, and the one link. */
export function invitationMail(input: {
  to: string;
  displayName: string;
  role: Role;
  invitedBy: string;
  link: string;
  expiresAt: Date;
}): OutgoingMail {
  return {
    to: input.to,
    kind: 'invitation',
    subject: 'You are invited to QuietLayer',
    text: [
      `Hello ${input.displayName},`,
      '',
      `${input.invitedBy} has invited you to QuietLayer at Larkspur Coatings as ${roleLabels[input.role]}.`,
      'Open this link to choose your password and sign in:',
      '',
      input.link,
      '',
      `The link works once and until ${input.expiresAt.toUTCString()}.`,
      'If you were not expecting this, you can ignore this message.',
      '',
      'QuietLayer at Larkspur Coatings',
    ].join('\n'),
  };
}
