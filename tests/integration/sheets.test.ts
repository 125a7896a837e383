import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { and, eq, inArray } from 'drizzle-orm';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents, dryingSetups, outboxMessages, propertySpreads, users } from '../../server/db/schema';
import { SOLVER_VERSION } from '../../shared/physics/version';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent, type TestUser } from './helpers/users';

let ctx: TestContext;
let checkId: string;
let fluidId: string;
const people: Record<string, TestUser> = {};
const agents: Record<string, TestAgent> = {};

/**
 * A made-up fluid with round numbers (no buoyancy, β = 0): μ = 10 mPa·s, k = 0.1 W/(m·K),
 * ρ = 1000 kg/m³, c_p = 1000 J/(kg·K) → κ = 1e-7 m²/s; dσ/dT = −0.1 mN/(m·K).
 * For d = 1 mm: Ma = 1e-4·ΔT·1e-3/(1e-2·1e-7) = 100·ΔT (hand calculation).
 */
const roundFluid = {
  kind: 'other',
  referenceTemperature: '20 °C',
  validFrom: '10 °C',
  validTo: '30 °C',
  density: { value: '1000 kg/m³', source: 'round number for the test', uncertaintyPercent: 2 },
  expansion: { value: '0 1/K', source: 'no buoyancy' },
  viscosity: { law: 'points', points: [{ temperature: '20 °C', value: '10 mPa·s' }], source: 'round number' },
  surfaceTension: { value: '30 mN/m', source: 'Müller–Łukasiewicz table (invented)', uncertaintyPercent: 3 },
  surfaceTensionSlope: { value: '-0.1 mN/(m·K)', source: 'round number', uncertaintyPercent: 15 },
  conductivity: { value: '0.1 W/(m·K)', source: 'round number' },
  heatCapacity: { value: '1000 J/(kg·K)', source: 'round number' },
};

/**
 * Flat, insulating-top layer on a rigid conducting plate at half of Pearson's onset:
 * Ma = 100 × 0.398035 = 39.8035, and Pearson (1958, J. Fluid Mech. 4:489–500) gives Ma_c = 79.607
 * for these boundaries, so the onset margin is 79.607 / 39.8035 = 2.000 (Quiet).
 */
const quietCheck = (fluidId: string) => ({
  title: 'Half-Pearson layer',
  fluidId,
  processKind: 'general-layer',
  temperature: '20 °C',
  depth: '1 mm',
  bottom: { mechanics: 'rigid', thermal: 'conducting' },
  top: 'surface',
  deformableSurface: false,
  heating: { mode: 'deltaT', deltaT: '0.398035 K' },
});

async function newSheet(agent = agents.author, body: Record<string, unknown> = {}) {
  const res = await agent.post('/api/sheets').send({ checkId, line: 'Line 2', purpose: 'Release the test layer on Line 2.', ...body });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: string; number: string; revision: number; state: string };
}

async function submitted() {
  const sheet = await newSheet();
  const res = await agents.author.post(`/api/sheets/${sheet.id}/submit`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return sheet;
}

async function sign(id: string, who = 'reviewer', meaning = 'approved-for-production') {
  return agents[who].post(`/api/sheets/${id}/sign`).send({ password: people[who].password, meaning });
}

async function mailTo(email: string, kind: string) {
  return ctx.db.select().from(outboxMessages).where(and(eq(outboxMessages.toAddress, email), eq(outboxMessages.kind, kind)));
}

function pdfText(bytes: Buffer): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'ql-sheet-'));
  const file = path.join(dir, 'sheet.pdf');
  writeFileSync(file, bytes);
  return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
}

async function pdfOf(id: string): Promise<Buffer> {
  const res = await agents.author.get(`/api/sheets/${id}/pdf`).buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toBe('application/pdf');
  return res.body as Buffer;
}

beforeAll(async () => {
  ctx = createTestContext();
  const roles = {
    author: 'engineer',
    otherEngineer: 'engineer',
    reviewer: 'reviewer',
    fumbler: 'reviewer',
    technician: 'technician',
    administrator: 'administrator',
  } as const;
  for (const [name, role] of Object.entries(roles)) {
    people[name] = await createTestUser(ctx.db, { role, label: name });
    agents[name] = await signedInAgent(ctx.app, people[name]);
  }
  const fluid = await agents.author.post('/api/fluids').send({ ...roundFluid, name: `Round fluid ${Date.now()}` });
  expect(fluid.status).toBe(201);
  fluidId = fluid.body.id;
  const check = await agents.author.post('/api/layer-checks').send(quietCheck(fluidId));
  expect(check.status).toBe(201);
  checkId = check.body.id;
});

afterAll(async () => {
  await ctx.close();
});

describe('issuing a sheet from a layer check', () => {
  it('makes revision 1, Draft, with a site sheet number and a snapshot of inputs, properties with sources, results and the solver version', async () => {
    const sheet = await newSheet();
    expect(sheet.number).toMatch(/^LC-PS-\d{4}$/);
    const res = await agents.author.get(`/api/sheets/${sheet.id}`);
    expect(res.status).toBe(200);
    const body = res.body;
    expect(body).toMatchObject({ revision: 1, state: 'draft', line: 'Line 2', checkRevision: 1, solverVersion: SOLVER_VERSION });
    expect(body.snapshot.solverVersion).toBe(SOLVER_VERSION);
    expect(body.snapshot.input.depth).toBe('1 mm');
    const sigma = body.snapshot.fluid.properties.find((p: { key: string }) => p.key === 'surfaceTension');
    expect(sigma).toMatchObject({ value: '30 mN/m', source: 'Müller–Łukasiewicz table (invented)', uncertaintyPercent: 3, siUnit: 'N/m' });
    expect(sigma.si).toBeCloseTo(0.03, 12);
    // Hand calculation above: Ma = 100·ΔT; Pearson (1958) Ma_c = 79.607 → margin 2.000.
    expect(body.snapshot.results.groups.marangoni).toBeCloseTo(39.8035, 4);
    expect(body.snapshot.results.margin).toBeCloseTo(2, 3);
    expect(body.snapshot.results.status).toBe('quiet');
    expect(body.snapshot.window.cellBoundary.length).toBe(body.snapshot.window.depths.length);
    expect(body.allowedActions).toEqual(['submit']);
  });

  it('numbers sheets one after another per site', async () => {
    const a = await newSheet();
    const b = await newSheet();
    expect(Number(b.number.slice(-4))).toBe(Number(a.number.slice(-4)) + 1);
  });

  it('keeps the snapshot when the fluid changes later (reproducible sheet)', async () => {
    const sheet = await newSheet();
    const check = await agents.author.get(`/api/layer-checks/${checkId}`);
    const fluid = await agents.author.get(`/api/fluids/${check.body.fluidId}`);
    const { id: _id, archived: _a, checkCount: _c, createdAt: _ca, updatedAt: _u, version, ...rest } = fluid.body;
    const changed = await agents.author.put(`/api/fluids/${check.body.fluidId}`).send({
      ...roundFluid,
      name: rest.name,
      surfaceTension: { value: '31 mN/m', source: 'changed later' },
      version,
    });
    expect(changed.status, JSON.stringify(changed.body)).toBe(200);
    const after = await agents.author.get(`/api/sheets/${sheet.id}`);
    const sigma = after.body.snapshot.fluid.properties.find((p: { key: string }) => p.key === 'surfaceTension');
    expect(sigma.value).toBe('30 mN/m');
    const back = await agents.author.put(`/api/fluids/${check.body.fluidId}`).send({ ...roundFluid, name: rest.name, version: changed.body.version });
    expect(back.status).toBe(200);
  });

  it('refuses other roles (403) and names bad fields (400/422)', async () => {
    for (const who of ['reviewer', 'technician', 'administrator']) {
      const res = await agents[who].post('/api/sheets').send({ checkId, line: 'Line 2', purpose: 'x' });
      expect(res.status, who).toBe(403);
    }
    const missing = await agents.author.post('/api/sheets').send({ checkId });
    expect(missing.status).toBe(400);
    expect(Object.keys(missing.body.error.fields)).toEqual(expect.arrayContaining(['line', 'purpose']));
    const unknown = await agents.author.post('/api/sheets').send({ checkId: '00000000-0000-4000-8000-000000000000', line: 'L', purpose: 'p' });
    expect(unknown.status).toBe(422);
    expect(unknown.body.error.fields.checkId).toBeDefined();
    const noRevision = await agents.author.post('/api/sheets').send({ checkId, checkRevision: 99, line: 'L', purpose: 'p' });
    expect(noRevision.status).toBe(422);
    expect(noRevision.body.error.fields.checkRevision).toBeDefined();
  });

  it('answers 401 without a session and 404 for an unknown sheet', async () => {
    expect((await request(ctx.app).get('/api/sheets')).status).toBe(401);
    expect((await agents.technician.get('/api/sheets/00000000-0000-4000-8000-000000000000')).status).toBe(404);
  });
});

describe('workflow: submit', () => {
  it('Draft → Awaiting review by the author; reviewers get an e-mail with a link to the sheet', async () => {
    const sheet = await newSheet();
    const res = await agents.author.post(`/api/sheets/${sheet.id}/submit`);
    expect(res.status).toBe(200);
    expect(res.body.state).toBe('awaiting-review');
    const mails = await mailTo(people.reviewer.email, 'sheet-review-request');
    const mail = mails.find((m) => m.textBody.includes(`/sheets/${sheet.id}`));
    expect(mail?.textBody).toContain(`http://quietlayer.test/sheets/${sheet.id}`);
    expect(mail?.subject).toContain(sheet.number);
    // The author is never asked to review their own sheet.
    expect((await mailTo(people.author.email, 'sheet-review-request')).length).toBe(0);
  });

  it('refuses a second submit (409), another engineer (403) and non-engineers (403)', async () => {
    const sheet = await submitted();
    expect((await agents.author.post(`/api/sheets/${sheet.id}/submit`)).status).toBe(409);
    const draft = await newSheet();
    expect((await agents.otherEngineer.post(`/api/sheets/${draft.id}/submit`)).status).toBe(403);
    for (const who of ['reviewer', 'technician', 'administrator']) expect((await agents[who].post(`/api/sheets/${draft.id}/submit`)).status, who).toBe(403);
  });
});

describe('workflow: return', () => {
  it('Awaiting review → Returned with comments; the author gets the comments by e-mail', async () => {
    const sheet = await submitted();
    const noComment = await agents.reviewer.post(`/api/sheets/${sheet.id}/return`).send({ comments: '  ' });
    expect(noComment.status).toBe(400);
    expect(noComment.body.error.fields.comments).toBeDefined();
    const res = await agents.reviewer.post(`/api/sheets/${sheet.id}/return`).send({ comments: 'State the source of dσ/dT, please.' });
    expect(res.status).toBe(200);
    expect(res.body.state).toBe('returned');
    expect(res.body.returns[0]).toMatchObject({ reviewerName: people.reviewer.displayName, comments: 'State the source of dσ/dT, please.' });
    const mails = await mailTo(people.author.email, 'sheet-returned');
    expect(mails.some((m) => m.textBody.includes('State the source of dσ/dT, please.') && m.textBody.includes(`/sheets/${sheet.id}`))).toBe(true);
    const audit = await ctx.db.select().from(auditEvents).where(and(eq(auditEvents.entityId, sheet.id), eq(auditEvents.action, 'sheet.returned')));
    expect(audit[0].reason).toBe('State the source of dσ/dT, please.');
  });

  it('refuses to return a Draft or a Returned sheet (409) and lets no other role return (403)', async () => {
    const draft = await newSheet();
    expect((await agents.reviewer.post(`/api/sheets/${draft.id}/return`).send({ comments: 'x' })).status).toBe(409);
    const sheet = await submitted();
    for (const who of ['author', 'technician', 'administrator']) {
      expect((await agents[who].post(`/api/sheets/${sheet.id}/return`).send({ comments: 'x' })).status, who).toBe(403);
    }
    expect((await agents.reviewer.post(`/api/sheets/${sheet.id}/return`).send({ comments: 'x' })).status).toBe(200);
    expect((await agents.reviewer.post(`/api/sheets/${sheet.id}/return`).send({ comments: 'again' })).status).toBe(409);
    expect((await sign(sheet.id)).status).toBe(409);
    expect((await agents.author.post(`/api/sheets/${sheet.id}/submit`)).status).toBe(409);
  });
});

describe('workflow: sign, revise, supersede', () => {
  it('signs with password and meaning: signature record, SHA-256 of the stored PDF, mail to the author', async () => {
    const sheet = await submitted();
    const res = await sign(sheet.id, 'reviewer', 'approved-for-production');
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.state).toBe('signed');
    expect(res.body.signature).toMatchObject({
      signerId: people.reviewer.id,
      printedName: people.reviewer.displayName,
      role: 'reviewer',
      meaning: 'approved-for-production',
    });
    expect(Date.now() - Date.parse(res.body.signature.signedAt)).toBeLessThan(60_000);
    const pdf = await pdfOf(sheet.id);
    const sha = createHash('sha256').update(pdf).digest('hex');
    expect(res.body.signature.pdfSha256).toBe(sha);
    expect(res.body.pdfSha256).toBe(sha);
    // The stored bytes are served every time.
    expect((await pdfOf(sheet.id)).equals(pdf)).toBe(true);
    const mails = await mailTo(people.author.email, 'sheet-signed');
    expect(mails.some((m) => m.textBody.includes(`/sheets/${sheet.id}`) && m.textBody.includes(people.reviewer.displayName))).toBe(true);
    expect(res.body.allowedActions).toEqual([]);
  });

  it('refuses to sign a Draft (409), a Signed sheet again (409), and an unknown meaning (400)', async () => {
    const draft = await newSheet();
    expect((await sign(draft.id)).status).toBe(409);
    const sheet = await submitted();
    const badMeaning = await agents.reviewer.post(`/api/sheets/${sheet.id}/sign`).send({ password: people.reviewer.password, meaning: 'looks fine' });
    expect(badMeaning.status).toBe(400);
    expect(badMeaning.body.error.fields.meaning).toBeDefined();
    const noPassword = await agents.reviewer.post(`/api/sheets/${sheet.id}/sign`).send({ meaning: 'reviewed' });
    expect(noPassword.status).toBe(400);
    expect((await sign(sheet.id, 'reviewer', 'reviewed')).status).toBe(200);
    expect((await sign(sheet.id)).status).toBe(409);
  });

  it('lets no technician, engineer or administrator sign (403)', async () => {
    const sheet = await submitted();
    for (const who of ['technician', 'author', 'otherEngineer', 'administrator']) {
      expect((await sign(sheet.id, who)).status, who).toBe(403);
    }
  });

  it('refuses a reviewer who authored the revision (403)', async () => {
    const writer = await createTestUser(ctx.db, { role: 'engineer', label: 'writer' });
    const writerAgent = await signedInAgent(ctx.app, writer);
    const sheet = await newSheet(writerAgent);
    expect((await writerAgent.post(`/api/sheets/${sheet.id}/submit`)).status).toBe(200);
    await ctx.db.update(users).set({ role: 'reviewer' }).where(eq(users.id, writer.id));
    const res = await writerAgent.post(`/api/sheets/${sheet.id}/sign`).send({ password: writer.password, meaning: 'reviewed' });
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/another QA reviewer/);
    expect((await writerAgent.post(`/api/sheets/${sheet.id}/return`).send({ comments: 'mine' })).status).toBe(403);
  });

  it('makes a new revision of a Returned sheet from the newest check revision; the old one cannot be revised again (409)', async () => {
    // A check of its own: this test saves a new check revision, which other tests must not see.
    const own = await agents.author.post('/api/layer-checks').send({ ...quietCheck(fluidId), title: 'Check revised during review' });
    const sheet = await newSheet(agents.author, { checkId: own.body.id });
    expect((await agents.author.post(`/api/sheets/${sheet.id}/submit`)).status).toBe(200);
    await agents.reviewer.post(`/api/sheets/${sheet.id}/return`).send({ comments: 'Thinner, please.' });
    const check = await agents.author.get(`/api/layer-checks/${own.body.id}`);
    const { id: _i, fluidName: _f, fluidArchived: _fa, ownerId: _o, ownerName: _on, revision: _r, version, savedMargin: _m, savedRegime: _s, createdAt: _c, updatedAt: _u, ...input } = check.body;
    const saved = await agents.author.put(`/api/layer-checks/${own.body.id}`).send({ ...input, depth: '0.9 mm', version });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    const revised = await agents.author.post(`/api/sheets/${sheet.id}/revisions`).send({});
    expect(revised.status, JSON.stringify(revised.body)).toBe(201);
    expect(revised.body).toMatchObject({ number: sheet.number, revision: 2, state: 'draft', checkRevision: saved.body.revision });
    expect(revised.body.snapshot.input.depth).toBe('0.9 mm');
    expect(revised.body.revisions.map((r: { revision: number }) => r.revision)).toEqual([2, 1]);
    // The new revision's PDF keeps the reviewer's return of revision 1 and says what it replaces.
    const text = pdfText(await pdfOf(revised.body.id)).replace(/\s+/g, ' ');
    expect(text).toMatch(/Revision 1, \d{4}-\d\d-\d\d \d\d:\d\d:\d\d UTC, Test reviewer [^:]+: Thinner, please\./);
    expect(text).toContain('replaces revision 1 of this sheet once signed');
    expect((await agents.author.post(`/api/sheets/${sheet.id}/revisions`).send({})).status).toBe(409);
    expect((await agents.author.post(`/api/sheets/${revised.body.id}/revisions`).send({})).status).toBe(409);
    expect((await agents.reviewer.post(`/api/sheets/${revised.body.id}/revisions`).send({})).status).toBe(403);
  });

  it('supersedes the earlier signed revision when a later one is signed; Superseded cannot be signed or revised (409)', async () => {
    const sheet = await submitted();
    expect((await sign(sheet.id)).status).toBe(200);
    const rev2 = await agents.otherEngineer.post(`/api/sheets/${sheet.id}/revisions`).send({ purpose: 'Second release.' });
    expect(rev2.status).toBe(201);
    expect(rev2.body.authorId).toBe(people.otherEngineer.id);
    expect((await agents.otherEngineer.post(`/api/sheets/${rev2.body.id}/submit`)).status).toBe(200);
    // The original author is a different person now and may not submit rev 2, but the reviewer signs it.
    const signed = await sign(rev2.body.id, 'reviewer', 'reviewed');
    expect(signed.status).toBe(200);
    const first = await agents.author.get(`/api/sheets/${sheet.id}`);
    expect(first.body.state).toBe('superseded');
    expect(first.body.supersededBy).toEqual({ id: rev2.body.id, revision: 2 });
    expect((await sign(sheet.id)).status).toBe(409);
    expect((await agents.author.post(`/api/sheets/${sheet.id}/revisions`).send({})).status).toBe(409);
    // The superseded revision's signed PDF is still retrievable.
    expect((await pdfOf(sheet.id)).subarray(0, 5).toString()).toBe('%PDF-');
    const actions = first.body.audit.map((a: { action: string }) => a.action);
    expect(actions).toEqual(expect.arrayContaining(['sheet.created', 'sheet.submitted', 'sheet.signed', 'sheet.superseded', 'sheet.revised']));
  });
});

describe('password re-entry', () => {
  it('refuses a wrong password (422, not signed), audits it, and e-mails the administrators after repeated failures', async () => {
    const sheet = await submitted();
    for (let i = 0; i < 3; i += 1) {
      const res = await agents.fumbler.post(`/api/sheets/${sheet.id}/sign`).send({ password: 'not-my-password', meaning: 'reviewed' });
      expect(res.status).toBe(422);
      expect(res.body.error.fields.password).toBeDefined();
    }
    const state = await agents.fumbler.get(`/api/sheets/${sheet.id}`);
    expect(state.body.state).toBe('awaiting-review');
    const failures = await ctx.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.actorId, people.fumbler.id), eq(auditEvents.action, 'sheet.sign_failed')));
    expect(failures.length).toBe(3);
    const alerts = await mailTo(people.administrator.email, 'sheet-sign-failures-alert');
    expect(alerts.some((m) => m.textBody.includes(people.fumbler.email) && m.textBody.includes(sheet.number))).toBe(true);
    // The right password still signs.
    expect((await sign(sheet.id, 'fumbler', 'reviewed')).status).toBe(200);
  });

  it('pauses signing for a person after six wrong passwords in 15 minutes (429)', async () => {
    const sloppy = await createTestUser(ctx.db, { role: 'reviewer', label: 'sloppy' });
    const agent = await signedInAgent(ctx.app, sloppy);
    const sheet = await submitted();
    for (let i = 0; i < 6; i += 1) expect((await agent.post(`/api/sheets/${sheet.id}/sign`).send({ password: 'wrong', meaning: 'reviewed' })).status).toBe(422);
    const res = await agent.post(`/api/sheets/${sheet.id}/sign`).send({ password: sloppy.password, meaning: 'reviewed' });
    expect(res.status).toBe(429);
  });
});

describe('signed records cannot change (database trigger)', () => {
  let signedId: string;
  beforeAll(async () => {
    const sheet = await submitted();
    expect((await sign(sheet.id)).status).toBe(200);
    signedId = sheet.id;
  });

  const rejects = async (statement: string) => {
    await expect(ctx.pool.query(statement, [signedId])).rejects.toThrow(/cannot be (changed|deleted)|append-only/);
  };

  it('rejects UPDATE of the snapshot, the PDF, the hash and the state, and DELETE, of a Signed revision', async () => {
    await rejects(`update sheet_revisions set snapshot = jsonb_set(snapshot, '{input,depth}', '"2 mm"') where id = $1`);
    await rejects(`update sheet_revisions set signed_pdf = signed_pdf || '\\x00'::bytea where id = $1`);
    await rejects(`update sheet_revisions set pdf_sha256 = repeat('0', 64) where id = $1`);
    await rejects(`update sheet_revisions set state = 'draft' where id = $1`);
    await rejects(`update sheet_revisions set state = 'superseded', purpose = 'changed' where id = $1`);
    await rejects(`delete from sheet_revisions where id = $1`);
  });

  it('rejects UPDATE and DELETE of its signature', async () => {
    await rejects(`update sheet_signatures set printed_name = 'Someone else' where revision_id = $1`);
    await rejects(`delete from sheet_signatures where revision_id = $1`);
  });

  it('allows the one step Signed → Superseded that changes the state alone (rolled back here)', async () => {
    const client = await ctx.pool.connect();
    try {
      await client.query('begin');
      const res = await client.query(`update sheet_revisions set state = 'superseded' where id = $1`, [signedId]);
      expect(res.rowCount).toBe(1);
      await expect(client.query(`update sheet_revisions set state = 'signed' where id = $1`, [signedId])).rejects.toThrow(/cannot be changed/);
    } finally {
      await client.query('rollback');
      client.release();
    }
  });

  it('refuses to mark a revision Signed without the SHA-256 of exactly its PDF bytes', async () => {
    const draft = await submitted();
    await expect(
      ctx.pool.query(`update sheet_revisions set state = 'signed', signed_pdf = '\\x255044462d'::bytea, pdf_sha256 = repeat('a', 64) where id = $1`, [draft.id]),
    ).rejects.toThrow(/SHA-256/);
  });
});

describe('the PDF', () => {
  it('holds the key values as selectable text, the cautions, the closing line and a footer on every page', async () => {
    const sheet = await submitted();
    expect((await sign(sheet.id, 'reviewer', 'approved-for-production')).status).toBe(200);
    const pdf = await pdfOf(sheet.id);
    expect(pdf.length).toBeLessThan(250_000);
    const text = pdfText(pdf);
    expect(text).toContain('Larkspur Coatings');
    expect(text).toContain(sheet.number);
    expect(text).toContain('Revision 1');
    expect(text).toContain('State: Signed');
    expect(text).toContain('Line 2');
    expect(text).toContain('Release the test layer on Line 2.');
    // Property table with value, unit, source and uncertainty as entered.
    expect(text).toMatch(/30 mN\/m\s+0\.03000 N\/m\s+Müller–Łukasiewicz table\s+± 3\.00 %/);
    expect(text).toContain('(invented)');
    // Ma = 100·ΔT = 39.80 (hand calculation); Ma_c = 79.61 (Pearson 1958); margin 2.00 with its word.
    expect(text).toMatch(/Marangoni Ma = .*39\.80/);
    expect(text).toMatch(/Critical Ma, surface tension alone\s+79\.6/);
    expect(text).toMatch(/2\.00 ×\s+Quiet/);
    expect(text).toContain('Regime: Quiet');
    // Wavelength 2πd/k_c with k_c = 1.993 (Pearson 1958) → 3.153 mm for d = 1 mm.
    expect(text).toMatch(/Cell wavelength 2πd\/k_c\s+3\.15\d mm/);
    expect(text).toContain('Layer depth d [mm], logarithmic');
    // The closing line of DOMAIN.md §11, word for word (pdftotext breaks it over lines).
    expect(text.replace(/\s+/g, ' ')).toContain(
      "QuietLayer predicts flow behaviour; it is not a safety design tool. Follow NFPA 86 / EN 1539 (or your local code), your insurer's requirements and your authority having jurisdiction.",
    );
    // General-layer cautions, deferring to local codes and qualified practice.
    expect(text).toContain('Hot liquids and surfaces burn');
    expect(text).toContain('Local codes, your site procedures and qualified, licensed practice take precedence');
    expect(text).toContain(people.reviewer.displayName);
    expect(text).toContain('QA reviewer');
    expect(text).toContain('Approved for production');
    const pages = Number(/page 1 of (\d+)/.exec(text)?.[1]);
    expect(pages).toBeGreaterThanOrEqual(2);
    for (let p = 1; p <= pages; p += 1) expect(text).toContain(`page ${p} of ${pages}`);
    expect(text.split('Verify this document at http://quietlayer.test/verify: upload the PDF; its SHA-256 must match the signed record.').length - 1).toBe(pages);
    const fonts = execFileSync('pdffonts', ['-'], { input: pdf, encoding: 'utf8' });
    expect(fonts).toMatch(/NotoSans-Regular\s+CID TrueType\s+Identity-H\s+yes yes yes/);
    expect(fonts).toMatch(/NotoSans-Bold/);
  });

  it('is the same bytes every time for the same unsigned snapshot, with empty signature lines', async () => {
    const sheet = await newSheet();
    const a = await pdfOf(sheet.id);
    const b = await pdfOf(sheet.id);
    expect(a.equals(b)).toBe(true);
    const text = pdfText(a);
    expect(text).toContain('State: Draft');
    expect(text).toMatch(/Printed name\s*\n/);
    expect(text).toContain('Not signed.');
  });
});

describe('verification', () => {
  let signed: { id: string; number: string };
  let pdf: Buffer;
  beforeAll(async () => {
    signed = await submitted();
    expect((await sign(signed.id, 'reviewer', 'reviewed')).status).toBe(200);
    pdf = await pdfOf(signed.id);
  });

  it('finds the signed sheet and revision of an uploaded PDF, who signed it and when (any signed-in role)', async () => {
    const res = await agents.technician.post('/api/sheets/verify').attach('file', pdf, { filename: 'copy.pdf', contentType: 'application/octet-stream' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({
      match: true,
      revisionId: signed.id,
      number: signed.number,
      revision: 1,
      state: 'signed',
      signature: { printedName: people.reviewer.displayName, meaning: 'reviewed', role: 'reviewer' },
    });
    expect(res.body.sha256).toBe(createHash('sha256').update(pdf).digest('hex'));
  });

  it('matches none when one byte is changed', async () => {
    const tampered = Buffer.from(pdf);
    const at = Math.floor(tampered.length / 2);
    tampered[at] = tampered[at] ^ 0x01;
    const res = await agents.reviewer.post('/api/sheets/verify').attach('file', tampered, { filename: 'sheet.pdf', contentType: 'application/pdf' });
    expect(res.status).toBe(200);
    expect(res.body.match).toBe(false);
  });

  it('rejects a file that is not a PDF by its bytes (422), even when declared as one, and a missing file (400)', async () => {
    const fake = await agents.reviewer.post('/api/sheets/verify').attach('file', Buffer.from('GIF89a not a pdf'), { filename: 'x.pdf', contentType: 'application/pdf' });
    expect(fake.status).toBe(422);
    expect(fake.body.error.fields.file).toMatch(/%PDF-/);
    const none = await agents.reviewer.post('/api/sheets/verify').field('other', 'x');
    expect(none.status).toBe(400);
    expect(none.body.error.fields.file).toBeDefined();
    expect((await request(ctx.app).post('/api/sheets/verify').attach('file', pdf, 'x.pdf')).status).toBe(401);
  });

  it('rejects an upload above 20 MB (413)', async () => {
    const big = Buffer.alloc(20 * 1024 * 1024 + 1, 0x20);
    big.write('%PDF-1.7');
    const res = await agents.reviewer.post('/api/sheets/verify').attach('file', big, 'big.pdf');
    expect(res.status).toBe(413);
  });
});

describe('list and filters', () => {
  it('filters by state, line and author, and lists the newest revision of each sheet by default', async () => {
    const sheet = await newSheet(agents.otherEngineer, { line: 'Caster B' });
    const byLine = await agents.technician.get('/api/sheets').query({ line: 'Caster B', pageSize: 200 });
    expect(byLine.status).toBe(200);
    expect(byLine.body.items.some((i: { id: string }) => i.id === sheet.id)).toBe(true);
    expect(byLine.body.items.every((i: { line: string }) => i.line === 'Caster B')).toBe(true);
    const byAuthor = await agents.technician.get('/api/sheets').query({ authorId: people.otherEngineer.id, state: 'draft', pageSize: 200 });
    expect(byAuthor.body.items.length).toBeGreaterThan(0);
    expect(byAuthor.body.items.every((i: { authorId: string; state: string }) => i.authorId === people.otherEngineer.id && i.state === 'draft')).toBe(true);
    const latest = await agents.technician.get('/api/sheets').query({ pageSize: 200 });
    const numbers = latest.body.items.map((i: { number: string }) => i.number);
    expect(new Set(numbers).size).toBe(numbers.length);
    const bad = await agents.technician.get('/api/sheets').query({ state: 'approved' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.state).toBeDefined();
    const filters = await agents.technician.get('/api/sheets/filters');
    expect(filters.body.lines).toEqual(expect.arrayContaining(['Line 2', 'Caster B']));
    expect(filters.body.authors.map((a: { id: string }) => a.id)).toEqual(expect.arrayContaining([people.author.id, people.otherEngineer.id]));
  });
});

describe('audit trail of a sheet', () => {
  it('records create, submit and return with the actor', async () => {
    const sheet = await submitted();
    await agents.reviewer.post(`/api/sheets/${sheet.id}/return`).send({ comments: 'No.' });
    const rows = await ctx.db.select().from(auditEvents).where(inArray(auditEvents.entityId, [sheet.id]));
    const byAction = Object.fromEntries(rows.map((r) => [r.action, r.actorEmail]));
    expect(byAction).toMatchObject({
      'sheet.created': people.author.email,
      'sheet.submitted': people.author.email,
      'sheet.returned': people.reviewer.email,
    });
  });
});

describe('drying path and property spread on the sheet', () => {
  it('carries the saved drying set-up and the newest finished property spread of the check revision into the snapshot and the PDF', async () => {
    const own = await agents.author.post('/api/layer-checks').send({ ...quietCheck(fluidId), title: 'Check with drying and spread', processKind: 'drying-coat' });
    expect(own.status).toBe(201);
    // Stored results as the drying-path and property-spread features save them (values made up for this test).
    await ctx.db.insert(dryingSetups).values({
      checkId: own.body.id,
      revision: 1,
      title: 'Oven at 3 m/min',
      input: {},
      resultSummary: {
        verdict: 'quiet',
        verdictText: 'No cells form along the path.',
        minThermalMargin: 3.5,
        minSolutalMargin: null,
        zones: [
          { name: 'Zone 1', residenceTime: 20, thicknessOut: 45e-6, solidsOut: 0.42, maxFilmTemperature: 318.15, solventLitresPerMinute: 0.8, freshAirRequired: 12, lflFraction: 0.12, ventilationText: null },
        ],
      },
    });
    await ctx.db.insert(propertySpreads).values({
      checkId: own.body.id,
      revision: 1,
      status: 'done',
      samples: 2000,
      seed: 7,
      chunkSize: 2000,
      uncertainties: [],
      layer: {},
      plan: {},
      evaluatedSamples: 2000,
      result: {
        validSamples: 2000,
        onsetProbability: 0.031,
        marginPercentiles: { p5: 1.1, p50: 1.6, p95: 2.2 },
        swing: [
          { name: 'viscosity', marginLow: 1.4, marginHigh: 1.8, swing: 0.4 },
          { name: 'surfaceTensionSlope', marginLow: 2.1, marginHigh: 1.2, swing: 0.9 },
        ],
      },
      finishedAt: new Date(),
    });
    const sheet = await newSheet(agents.author, { checkId: own.body.id });
    const detail = await agents.author.get(`/api/sheets/${sheet.id}`);
    expect(detail.body.snapshot.dryingPath).toMatchObject({ title: 'Oven at 3 m/min', minThermalMargin: 3.5, zones: [{ zone: 'Zone 1', lflFraction: 0.12 }] });
    expect(detail.body.snapshot.propertySpread).toMatchObject({ samples: 2000, probabilityOfOnset: 0.031, marginP50: 1.6 });
    expect(detail.body.snapshot.propertySpread.drivers.map((d: { property: string }) => d.property)).toEqual(['surfaceTensionSlope', 'viscosity']);
    const text = pdfText(await pdfOf(sheet.id));
    expect(text).toContain('Drying path: Oven at 3 m/min');
    expect(text).toContain('No cells form along the path.');
    expect(text).toMatch(/Zone 1\s+20\.00 s\s+45\.00 µm\s+42\.0 %\s+45\.0 °C\s+0\.8000 L\/min\s+12\.0 %/);
    expect(text).toContain('Property spread');
    expect(text).toMatch(/Probability of onset\s+3\.10 %/);
    expect(text).toMatch(/1\.10 \/ 1\.60 \/ 2\.20/);
  });
});
