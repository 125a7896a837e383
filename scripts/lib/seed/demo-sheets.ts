import { eq } from 'drizzle-orm';
import { createSheetInputSchema, signSheetInputSchema } from '../../../shared/schemas/sheets';
import { verifyPassword } from '../../../server/auth/passwords';
import type { DbOrTx } from '../../../server/db/client';
import { processSheets } from '../../../server/db/schema/sheets';
import { users } from '../../../server/db/schema/users';
import { createSheet, signSheet, submitSheet } from '../../../server/features/sheets/sheets.service';
import { DEMO_CHECK_TITLES } from './demo-checks';
import { DEMO_ENGINEER, DEMO_REVIEWER, demoPublicUrl, demoUser, seededCheckId } from './demo-people';
import { DEMO_PASSWORD } from './demo-users';
import type { SeedStep } from './seed-step';

/** How far along the workflow a demo sheet is taken. */
type DemoSheetStage = 'draft' | 'awaiting-review' | 'signed';

interface DemoSheet {
  checkTitle: string;
  line: string;
  purpose: string;
  stage: DemoSheetStage;
}

/** The demo process sheets (INVENTED): one released, one waiting for the reviewer, one Draft. */
export const demoSheets: readonly DemoSheet[] = Object.freeze([
  {
    checkTitle: DEMO_CHECK_TITLES.line2Zone1,
    line: 'Line 2',
    purpose: 'Release primer PR-2 at 50 µm wet through the three-zone oven at 30 m/min (zone 1 air at 60 °C) for production.',
    stage: 'signed',
  },
  {
    checkTitle: DEMO_CHECK_TITLES.casterB,
    line: 'Caster B',
    purpose: 'Release the 150 µm dope on the belt, first drying section at 35 °C, for the next production campaign.',
    stage: 'awaiting-review',
  },
  {
    checkTitle: DEMO_CHECK_TITLES.weldRoot,
    line: 'Weld cell 1',
    purpose: 'Record the surface-flow direction of the 316L orbital root pass for the two heats in use.',
    stage: 'draft',
  },
]);

/** Whether the account still has the demo password (people may have changed it: then nobody signs). */
async function hasDemoPassword(db: DbOrTx, userId: string): Promise<boolean> {
  const [row] = await db.select({ hash: users.passwordHash }).from(users).where(eq(users.id, userId)).limit(1);
  return row?.hash ? verifyPassword(DEMO_PASSWORD, row.hash) : false;
}

/**
 * Issues the demo sheets through the sheet services, as the people would: the engineer issues a
 * sheet from the check's revision and submits it (every QA reviewer is e-mailed through the outbox);
 * the reviewer signs with the demo password, meaning "Approved for production", so the PDF, its
 * SHA-256 and the signature record are real and the gauge log has a released check (the author is
 * e-mailed). When the reviewer's password is no longer the demo one, the sheet stays Awaiting review.
 * A check that already has any sheet is skipped: the seed never takes a sheet people
 * made, or changed, further along.
 */
export const seedDemoSheets: SeedStep = {
  name: 'demo process sheets',
  async run({ db, log }) {
    const engineer = await demoUser(db, DEMO_ENGINEER);
    const reviewer = await demoUser(db, DEMO_REVIEWER);
    if (!engineer) return 0;
    const env = { PUBLIC_URL: demoPublicUrl() };
    let inserted = 0;
    for (const spec of demoSheets) {
      const checkId = await seededCheckId(db, spec.checkTitle);
      if (!checkId) continue;
      const [existing] = await db.select({ id: processSheets.id }).from(processSheets).where(eq(processSheets.checkId, checkId)).limit(1);
      if (existing) continue;
      if (spec.stage === 'signed' && !reviewer) continue;
      const sheet = await createSheet(db, engineer, createSheetInputSchema.parse({ checkId, line: spec.line, purpose: spec.purpose }));
      inserted += 1;
      if (spec.stage === 'draft') continue;
      await submitSheet(db, env, engineer, sheet.id);
      if (spec.stage === 'awaiting-review' || !reviewer) continue;
      if (!(await hasDemoPassword(db, reviewer.id))) {
        log(`demo process sheets: ${DEMO_REVIEWER} no longer has the demo password; ${sheet.number} left Awaiting review`);
        continue;
      }
      await signSheet(db, env, reviewer, sheet.id, signSheetInputSchema.parse({ password: DEMO_PASSWORD, meaning: 'approved-for-production' }));
    }
    return inserted;
  },
};
