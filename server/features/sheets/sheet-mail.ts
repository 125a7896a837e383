import type { OutgoingMail } from '../../mail/enqueue-mail';

/** What every sheet message names: which sheet, which revision, and where to open it. */
export interface SheetMailContext {
  number: string;
  revision: number;
  title: string;
  line: string;
  /** `${PUBLIC_URL}/sheets/<revision id>` */
  link: string;
}

const signature = ['', 'QuietLayer at Larkspur Coatings'];

/** The lines that name a sheet in a message (also used by the failed-signing alert). */
export function sheetHeading(sheet: SheetMailContext): string[] {
  return [`Process sheet ${sheet.number}, revision ${sheet.revision}: ${sheet.title}`, `Line: ${sheet.line}`];
}

function heading(sheet: SheetMailContext): string[] {
  return [...sheetHeading(sheet), ''];
}

export function reviewRequestMail(to: string, sheet: SheetMailContext, authorName: string): OutgoingMail {
  return {
    to,
    kind: 'sheet-review-request',
    subject: `Process sheet ${sheet.number} rev. ${sheet.revision} awaits your review`,
    text: [
      ...heading(sheet),
      `${authorName} submitted this process sheet for review. Open it, read the PDF, then sign it or return it with comments:`,
      '',
      sheet.link,
      ...signature,
    ].join('\n'),
  };
}

export function sheetSignedMail(to: string, sheet: SheetMailContext, signer: { name: string; meaning: string; signedAt: Date }): OutgoingMail {
  return {
    to,
    kind: 'sheet-signed',
    subject: `Process sheet ${sheet.number} rev. ${sheet.revision} was signed`,
    text: [
      ...heading(sheet),
      `${signer.name} signed this revision on ${signer.signedAt.toISOString().slice(0, 19).replace('T', ' ')} UTC.`,
      `Meaning of the signature: ${signer.meaning}`,
      '',
      sheet.link,
      ...signature,
    ].join('\n'),
  };
}

export function sheetReturnedMail(to: string, sheet: SheetMailContext, reviewerName: string, comments: string): OutgoingMail {
  return {
    to,
    kind: 'sheet-returned',
    subject: `Process sheet ${sheet.number} rev. ${sheet.revision} was returned with comments`,
    text: [
      ...heading(sheet),
      `${reviewerName} returned this revision. Comments:`,
      '',
      comments
        .split('\n')
        .map((l) => `  ${l}`)
        .join('\n'),
      '',
      'Make the changes in the layer check, then issue a new revision of the sheet from its page:',
      sheet.link,
      ...signature,
    ].join('\n'),
  };
}
