import type { OutgoingMail } from '../../mail/enqueue-mail';

/** The password-reset message: plain words and the one link. */
export function passwordResetMail(input: { to: string; displayName: string; link: string }): OutgoingMail {
  return {
    to: input.to,
    kind: 'password-reset',
    subject: 'Set a new QuietLayer password',
    text: [
      `Hello ${input.displayName},`,
      '',
      'Someone (hopefully you) asked to set a new password for your QuietLayer account.',
      'Open this link within the next hour to choose one:',
      '',
      input.link,
      '',
      'The link works once. If you did not ask for this, you can ignore this message:',
      'your current password stays as it is.',
      '',
      'QuietLayer at Larkspur Coatings',
    ].join('\n'),
  };
}
