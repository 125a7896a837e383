import type { Role } from '../../shared/schemas/roles';

export interface RoleGuide {
  /** One sentence: what this role is for. */
  summary: string;
  /** What a person in this role is responsible for in QuietLayer. */
  duties: readonly string[];
  /** What this role may not do, so nobody looks for it. */
  limits: readonly string[];
}

/** What each role does here, in QuietLayer's words (roles and duties from the product design). */
export const roleGuides: Record<Role, RoleGuide> = {
  administrator: {
    summary: 'You run this QuietLayer site: who can sign in, with which role, and the record of what changed.',
    duties: [
      'Invite people by e-mail and give each one a role.',
      'Change a role, or deactivate an account when someone leaves (reactivate it later if needed).',
      'Read the audit trail: every change and signature, who made it and when.',
      'Read the outbox to see which e-mails QuietLayer sent and whether they went out.',
    ],
    limits: ['You cannot deactivate yourself, and the site always keeps at least one active administrator.'],
  },
  engineer: {
    summary: 'You size the process: layer depth, temperatures and air flow, with margin before the line runs.',
    duties: [
      'Keep the fluid library, each property with its source and uncertainty.',
      'Set up layer checks and read the onset margin, the regime and the quiet window.',
      'Follow a drying path zone by zone and judge how uncertain properties move the margin.',
      'Issue process sheets for QA review.',
    ],
    limits: ['A signed process sheet cannot be changed; a new revision supersedes it.'],
  },
  technician: {
    summary: 'You run the coater or caster and check that what you measure stays inside the quiet window.',
    duties: [
      'Upload or post thickness readings in the gauge log against the released layer check.',
      'See at once which readings fall outside the quiet window.',
    ],
    limits: ['Released numbers are read-only for this role.'],
  },
  reviewer: {
    summary: 'You release processes: you review process sheets and sign them, or return them with comments.',
    duties: [
      'Review process sheets that are awaiting review.',
      'Sign a sheet (with your password) or return it with comments.',
      'Check later that a PDF is the one that was signed.',
    ],
    limits: ['Sizing and readings belong to engineers and technicians; you judge them.'],
  },
};
