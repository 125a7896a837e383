import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents, gaugeReadings, outboxMessages } from '../../server/db/schema';
import { evaluateLayer } from '../../shared/physics/sizing/evaluate-layer';
import { STANDARD_GRAVITY } from '../../shared/units/constants';
import { createReleasedCheck, type ReleasedCheckFixture } from './gauge-support';
import { createTestContext, type TestContext } from './helpers/test-app';
import { createTestUser, signedInAgent, type TestUser } from './helpers/users';

let ctx: TestContext;
let engineer: TestUser;
let engineerAgent: TestAgent;
let technicianAgent: TestAgent;
let reviewer: TestUser;
let reviewerAgent: TestAgent;
let released: ReleasedCheckFixture;

beforeAll(async () => {
  ctx = createTestContext();
  engineer = await createTestUser(ctx.db, { role: 'engineer' });
  engineerAgent = await signedInAgent(ctx.app, engineer);
  technicianAgent = await signedInAgent(ctx.app, await createTestUser(ctx.db, { role: 'technician' }));
  reviewer = await createTestUser(ctx.db, { role: 'reviewer' });
  reviewerAgent = await signedInAgent(ctx.app, reviewer);
  released = await createReleasedCheck(ctx.db, engineerAgent, engineer.id);
});
afterAll(async () => {
  await ctx.close();
});

/** The physics core at the released snapshot: Pearson's layer of the fixture at depth d, ΔT held (flat surface → cellMargin). */
function coreMarginAt(depth: number): number {
  return evaluateLayer({
    bottom: 'rigid',
    bottomThermal: 'conducting',
    top: 'surface',
    density: 1000,
    viscosity: 0.01,
    conductivity: 0.1,
    heatCapacity: 1000,
    expansion: 0,
    surfaceTension: 0.03,
    dSigmaDT: -1e-4,
    depth,
    deltaT: 0.79607,
    heatTransfer: 0,
    gravity: STANDARD_GRAVITY,
  }).cellMargin;
}

function upload(agent: TestAgent, revisionId: string, csv: string | Buffer, options: Record<string, unknown> = {}, path = 'uploads') {
  return agent
    .post(`/api/gauge/released/${revisionId}/${path}`)
    .field('options', JSON.stringify(options))
    .attach('file', Buffer.isBuffer(csv) ? csv : Buffer.from(csv, 'utf8'), { filename: '../../etc/gauge.csv', contentType: 'application/octet-stream' });
}

const goodCsv = [
  'Run,Position [m],Direction,WFT [µm],Operator',
  'R-100,0.0,MD,500,Avery',
  'R-100,1.5,MD,900,Avery',
  'R-100,3.0,MD,1100,Avery',
  '=HYPERLINK("x"),4.5,CD,600,@evil',
].join('\r\n');

describe('gauge log: upload, judge, list, export, alert', () => {
  it('previews the detected mapping, the first judged rows and the counts without saving', async () => {
    const res = await upload(technicianAgent, released.revisionId, goodCsv, {}, 'uploads/preview');
    expect(res.status).toBe(200);
    expect(res.body.detected.columns).toMatchObject({ run: 'Run', position: 'Position [m]', thickness: 'WFT [µm]', direction: 'Direction', operator: 'Operator' });
    expect(res.body.used.units.thickness).toBe('µm');
    expect(res.body.counts).toEqual({ quiet: 2, close: 1, over: 1 });
    expect(res.body.judged[0].line).toBe(2);
    expect(res.body.fileName).toBe('gauge.csv');
    const saved = await ctx.db.select({ id: gaugeReadings.id }).from(gaugeReadings).where(eq(gaugeReadings.revisionId, released.revisionId));
    expect(saved).toHaveLength(0);
  });

  it('judges each reading like the physics core at the snapshot (Pearson 1958: margin = 1 mm / d at this ΔT)', async () => {
    const res = await upload(technicianAgent, released.revisionId, goodCsv, { gaugeType: 'Wet comb, 25–2000 µm', calibrationDate: '2026-02-20' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ readingCount: 4, quietCount: 2, closeCount: 1, overCount: 1, gaugeType: 'Wet comb, 25–2000 µm', calibrationDate: '2026-02-20', source: 'upload' });
    const list = await technicianAgent.get(`/api/gauge/released/${released.revisionId}/readings?pageSize=10`);
    expect(list.status).toBe(200);
    expect(list.body.total).toBe(4);
    for (const reading of list.body.items) {
      const core = coreMarginAt(reading.wetThickness);
      expect(reading.margin / core).toBeCloseTo(1, 4);
      // Pearson: Ma_c = 79.607, Ma = 100·ΔT·(d / 1 mm) → margin = 1 mm / d
      expect(reading.margin).toBeCloseTo(1e-3 / reading.wetThickness, 3);
    }
    expect(list.body.items.map((r: { flag: string }) => r.flag)).toEqual(['quiet', 'close', 'over', 'quiet']);
    expect(list.body.items[0]).toMatchObject({ enteredThickness: 500, enteredUnit: 'µm', direction: 'md', operator: 'Avery', source: 'upload' });
  });

  it('filters by flag and run, summarises runs, and serves the chart series', async () => {
    const over = await technicianAgent.get(`/api/gauge/released/${released.revisionId}/readings?flag=over`);
    expect(over.body.total).toBe(1);
    expect(over.body.items[0].wetThickness).toBeCloseTo(1100e-6, 12);
    const run = await technicianAgent.get(`/api/gauge/released/${released.revisionId}/readings?run=R-100`);
    expect(run.body.total).toBe(3);
    const runs = await technicianAgent.get(`/api/gauge/released/${released.revisionId}/runs`);
    const r100 = runs.body.items.find((r: { run: string }) => r.run === 'R-100');
    expect(r100).toMatchObject({ count: 3, overCount: 1, closeCount: 1 });
    expect(r100.overShare).toBeCloseTo(1 / 3, 12);
    expect(r100.minThickness).toBeCloseTo(500e-6, 12);
    expect(r100.maxThickness).toBeCloseTo(1100e-6, 12);
    const series = await technicianAgent.get(`/api/gauge/released/${released.revisionId}/series`);
    expect(series.body.axis).toBe('position');
    expect(series.body.x).toEqual([0, 1.5, 3, 4.5]);
    const window = await technicianAgent.get(`/api/gauge/released/${released.revisionId}`);
    expect(window.body.quietLimits.upper / 1e-3).toBeCloseTo(1, 3);
    expect(window.body.closeLimits.upper / 1e-3).toBeCloseTo(0.8, 3);
    expect(window.body.readingCount).toBe(4);
  });

  it('exports judged readings as CSV with formula cells escaped by an apostrophe (OWASP CSV injection)', async () => {
    const res = await technicianAgent.get(`/api/gauge/released/${released.revisionId}/export.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const text = res.text;
    expect(text).toContain(`"'=HYPERLINK(""x"")"`);
    expect(text).toContain("'@evil");
    expect(text).not.toMatch(/(^|,)=HYPERLINK/m);
    expect(text.split('\r\n')[0]).toMatch(/^sheet,revision,run,sequence,position_m/);
  });

  it('sends exactly one alert e-mail per batch with Over readings to the check owner, in the outbox', async () => {
    const mails = await ctx.db
      .select()
      .from(outboxMessages)
      .where(and(eq(outboxMessages.toAddress, engineer.email), eq(outboxMessages.kind, 'gauge-over-alert')));
    expect(mails).toHaveLength(1);
    expect(mails[0].subject).toContain(released.number);
    expect(mails[0].textBody).toMatch(/Over 1/);
    expect(mails[0].textBody).toMatch(/Worst onset margin: 0\.909/);
    expect(mails[0].textBody).toContain(`http://quietlayer.test/gauge/${released.revisionId}`);
  });

  it('rejects a file with bad rows, naming their lines and columns, and saves nothing', async () => {
    const fresh = await createReleasedCheck(ctx.db, engineerAgent, engineer.id);
    const csv = ['run,pos [m],thickness [mil]', 'A,0,20', 'A,abc,20', 'A,2,20', ',3,20', 'A,4,-1'].join('\n');
    const res = await upload(technicianAgent, fresh.revisionId, csv);
    expect(res.status).toBe(422);
    expect(res.body.errors.map((e: { line: number; column: string }) => [e.line, e.column])).toEqual([
      [3, 'pos [m]'],
      [5, 'run'],
      [6, 'thickness [mil]'],
    ]);
    expect(res.body.error.message).toMatch(/lines 3, 5, 6; nothing was saved/);
    const list = await technicianAgent.get(`/api/gauge/released/${fresh.revisionId}/readings`);
    expect(list.body.total).toBe(0);
  });

  it('converts mil and °F exactly (1 mil = 25.4 µm, °F → K with its offset; NIST SP 811 App. B)', async () => {
    const fresh = await createReleasedCheck(ctx.db, engineerAgent, engineer.id);
    const csv = ['run,pos [m],t [mil],substrate [°F],air [°F]', 'B,0,20,212,68'].join('\n');
    const res = await upload(technicianAgent, fresh.revisionId, csv);
    expect(res.status).toBe(201);
    const list = await technicianAgent.get(`/api/gauge/released/${fresh.revisionId}/readings`);
    const [reading] = list.body.items;
    expect(reading.wetThickness / (20 * 25.4e-6)).toBeCloseTo(1, 12);
    expect(reading.substrateTemperature).toBeCloseTo(373.15, 9);
    expect(reading.airTemperature).toBeCloseTo(293.15, 9);
  });

  it('answers 413 with a clear message past 20 MB', async () => {
    const big = Buffer.alloc(20 * 1024 * 1024 + 10, 'a');
    const res = await upload(technicianAgent, released.revisionId, big);
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/larger than 20 MB/);
  });

  it('refuses uploads for a sheet revision that is not signed, and for roles that may not upload', async () => {
    const draft = await createReleasedCheck(ctx.db, engineerAgent, engineer.id, { state: 'draft' });
    expect((await upload(technicianAgent, draft.revisionId, goodCsv)).status).toBe(404);
    expect((await upload(reviewerAgent, released.revisionId, goodCsv)).status).toBe(403);
    expect((await upload(request.agent(ctx.app), released.revisionId, goodCsv)).status).toBe(401);
  });

  it('groups a run into SSPC-PA 2 spots against a given range (spot limits 80 %/120 %)', async () => {
    const fresh = await createReleasedCheck(ctx.db, engineerAgent, engineer.id);
    // 8–12 mil range; spots of three: 10, 6, 15 mil means → within, below 6.4, above 14.4 (SSPC-PA 2; DOMAIN §6 example).
    const mils = [10, 10, 10, 6, 6, 6, 15, 15, 15];
    const csv = ['run,pos [m],t [mil]', ...mils.map((m, i) => `S,${i * 0.01},${m}`)].join('\n');
    expect((await upload(technicianAgent, fresh.revisionId, csv)).status).toBe(201);
    const res = await technicianAgent.get(`/api/gauge/released/${fresh.revisionId}/spots?run=S&specMin=8%20mil&specMax=12%20mil`);
    expect(res.status).toBe(200);
    expect(res.body.spots.map((s: { verdict: string }) => s.verdict)).toEqual(['within', 'below', 'above']);
    expect(res.body.spotLimits.minimum / 25.4e-6).toBeCloseTo(6.4, 9);
    expect(res.body.spotLimits.maximum / 25.4e-6).toBeCloseTo(14.4, 9);
    expect(res.body.areas).toHaveLength(1);
    expect(res.body.areas[0].complete).toBe(false);
    const bad = await technicianAgent.get(`/api/gauge/released/${fresh.revisionId}/spots?run=S&readingsPerSpot=2`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.readingsPerSpot).toMatch(/≥ 3/);
  });
});

describe('gauge log: device tokens', () => {
  let token: string;
  let tokenId: string;
  const post = (bearer: string | null, body: Record<string, unknown>) => {
    const call = request(ctx.app).post('/api/gauge/readings');
    return (bearer === null ? call : call.set('Authorization', `Bearer ${bearer}`)).send(body);
  };
  const reading = (thicknessMicrons: number, position: number) => ({ run: 'D-1', position, thickness: thicknessMicrons, direction: 'MD' });

  it('issues a token once (engineers only) and lists it without the secret', async () => {
    expect((await technicianAgent.post('/api/gauge/tokens').send({ revisionId: released.revisionId, label: 'Inline gauge' })).status).toBe(403);
    const res = await engineerAgent.post('/api/gauge/tokens').send({ revisionId: released.revisionId, label: 'Line 2 inline gauge' });
    expect(res.status).toBe(201);
    token = res.body.token;
    tokenId = res.body.id;
    expect(token).toMatch(/^qlg_[A-Za-z0-9_-]{43}$/);
    expect(res.body.line).toBe('Line 2');
    const list = await engineerAgent.get(`/api/gauge/tokens?revisionId=${released.revisionId}`);
    expect(list.body.items.find((t: { id: string }) => t.id === tokenId)).not.toHaveProperty('token');
    expect(JSON.stringify(list.body)).not.toContain(token);
  });

  it('accepts a batch with the bearer token and never doubles it when the post is retried', async () => {
    const body = { batchId: 'gauge-2026-03-05-0001', readings: [reading(500, 10), reading(1200, 11)] };
    const first = await post(token, body);
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ readingCount: 2, overCount: 1, source: 'device', replayed: false });
    const retry = await post(token, body);
    expect(retry.status).toBe(200);
    expect(retry.body).toMatchObject({ id: first.body.id, readingCount: 2, replayed: true });
    const [a, b] = await Promise.all([post(token, { ...body, batchId: 'gauge-race' }), post(token, { ...body, batchId: 'gauge-race' })]);
    expect([a.status, b.status].sort()).toEqual([200, 201]);
    const rows = await ctx.db.select({ id: gaugeReadings.id }).from(gaugeReadings).where(and(eq(gaugeReadings.revisionId, released.revisionId), eq(gaugeReadings.run, 'D-1')));
    expect(rows).toHaveLength(4);
  });

  it('answers 401 without a token or with an unknown one, and 403 outside its scope', async () => {
    expect((await post(null, { batchId: 'x', readings: [reading(500, 1)] })).status).toBe(401);
    expect((await post('qlg_not-a-real-token', { batchId: 'x', readings: [reading(500, 1)] })).status).toBe(401);
    const other = await createReleasedCheck(ctx.db, engineerAgent, engineer.id, { line: 'Caster B' });
    const wrongSheet = await post(token, { batchId: 'scope-1', sheetId: other.sheetId, readings: [reading(500, 1)] });
    expect(wrongSheet.status).toBe(403);
    expect((await post(token, { batchId: 'scope-2', line: 'Caster B', readings: [reading(500, 1)] })).status).toBe(403);
    // A session cookie does not stand in for a token.
    const withCookie = await engineerAgent.post('/api/gauge/readings').send({ batchId: 'cookie', readings: [reading(500, 1)] });
    expect(withCookie.status).toBe(401);
  });

  it('rejects bad readings with their index and saves none of them', async () => {
    const res = await post(token, { batchId: 'bad-1', readings: [reading(500, 1), { run: 'D-1', position: 2, thickness: -3 }] });
    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields)).toEqual(['readings.1.thickness']);
    const again = await post(token, { batchId: 'bad-1', readings: [reading(500, 1)] });
    expect(again.status).toBe(201);
  });

  it('stops working once revoked', async () => {
    expect((await engineerAgent.post(`/api/gauge/tokens/${tokenId}/revoke`).send({})).status).toBe(204);
    const res = await post(token, { batchId: 'after-revoke', readings: [reading(500, 1)] });
    expect(res.status).toBe(401);
    expect(res.body.error.message).toMatch(/revoked/);
  });
});

describe('gauge log: nonconformance notes', () => {
  it('opens a note for a run with Over readings; the owner dispositions it; a QA reviewer closes it with a signature', async () => {
    const notes = await technicianAgent.get(`/api/gauge/notes?revisionId=${released.revisionId}&state=open`);
    const note = notes.body.items.find((n: { run: string }) => n.run === 'R-100');
    expect(note).toMatchObject({ state: 'open', overCount: 1, ownerId: engineer.id });
    expect(note.allowedActions).toEqual([]);

    const other = await signedInAgent(ctx.app, await createTestUser(ctx.db, { role: 'engineer' }));
    expect((await other.post(`/api/gauge/notes/${note.id}/disposition`).send({ disposition: 'Scrap' })).status).toBe(403);
    expect((await reviewerAgent.post(`/api/gauge/notes/${note.id}/close`).send({ password: reviewer.password, meaning: 'disposition-approved' })).status).toBe(422);

    const disposed = await engineerAgent.post(`/api/gauge/notes/${note.id}/disposition`).send({ disposition: 'Hold rolls 3–4 of run R-100 for visual inspection; recoat if orange peel is seen.' });
    expect(disposed.status).toBe(200);
    expect(disposed.body.state).toBe('dispositioned');

    const wrong = await reviewerAgent.post(`/api/gauge/notes/${note.id}/close`).send({ password: 'not-the-password', meaning: 'disposition-approved' });
    expect(wrong.status).toBe(422);
    expect(wrong.body.error.fields.password).toMatch(/not right/);
    expect((await technicianAgent.post(`/api/gauge/notes/${note.id}/close`).send({ password: 'x', meaning: 'disposition-approved' })).status).toBe(403);

    const closed = await reviewerAgent.post(`/api/gauge/notes/${note.id}/close`).send({ password: reviewer.password, meaning: 'disposition-approved' });
    expect(closed.status).toBe(200);
    expect(closed.body.state).toBe('closed');
    expect(closed.body.signature).toMatchObject({ printedName: reviewer.displayName, role: 'reviewer', meaning: 'disposition-approved' });
    expect(closed.body.signature.meaningText).toMatch(/Disposition approved/);
    expect((await engineerAgent.post(`/api/gauge/notes/${note.id}/disposition`).send({ disposition: 'changed' })).status).toBe(422);
  });

  it('audits every wrong password at closing, alerts the administrators at the third, and pauses signing after six in 15 minutes (429), as for process sheets', async () => {
    const admin = await createTestUser(ctx.db, { role: 'administrator' });
    const sloppy = await createTestUser(ctx.db, { role: 'reviewer', label: 'sloppy' });
    const agent = await signedInAgent(ctx.app, sloppy);
    const notes = await reviewerAgent.get(`/api/gauge/notes?revisionId=${released.revisionId}`);
    const noteId = notes.body.items[0].id as string;
    for (let i = 0; i < 6; i += 1) {
      const res = await agent.post(`/api/gauge/notes/${noteId}/close`).send({ password: 'wrong', meaning: 'disposition-approved' });
      expect(res.status).toBe(422);
      expect(res.body.error.message).toBe('The password is not right; the note was not signed.');
    }
    const failures = await ctx.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.actorId, sloppy.id), eq(auditEvents.action, 'gauge_note.signing_failed')));
    expect(failures).toHaveLength(6);
    expect(failures.every((f) => f.entityId === noteId && f.reason === 'wrong password at signing')).toBe(true);
    const alerts = await ctx.db
      .select()
      .from(outboxMessages)
      .where(and(eq(outboxMessages.toAddress, admin.email), eq(outboxMessages.kind, 'gauge-note-sign-failures-alert')));
    expect(alerts.length).toBe(2); // at the 3rd and the 6th failure
    const paused = await agent.post(`/api/gauge/notes/${noteId}/close`).send({ password: sloppy.password, meaning: 'disposition-approved' });
    expect(paused.status).toBe(429);
  });
});

describe('gauge log: readings are append-only QA records', () => {
  it('refuses a direct SQL UPDATE or DELETE of a reading or its batch with the trigger message; importing still works', async () => {
    const own = await createReleasedCheck(ctx.db, engineerAgent, engineer.id);
    const first = await upload(technicianAgent, own.revisionId, goodCsv);
    expect(first.status).toBe(201);
    const [reading] = await ctx.db.select().from(gaugeReadings).where(eq(gaugeReadings.revisionId, own.revisionId)).limit(1);

    await expect(ctx.pool.query('update gauge_readings set wet_thickness = 1e-6 where id = $1', [reading.id])).rejects.toThrow(
      'gauge_readings is append-only: UPDATE is not allowed',
    );
    await expect(ctx.pool.query('delete from gauge_readings where id = $1', [reading.id])).rejects.toThrow(
      'gauge_readings is append-only: DELETE is not allowed',
    );
    await expect(ctx.pool.query('update gauge_batches set over_count = 0 where id = $1', [reading.batchId])).rejects.toThrow(
      'gauge_batches is append-only: UPDATE is not allowed',
    );
    await expect(ctx.pool.query('truncate gauge_readings')).rejects.toThrow('gauge_readings is append-only: TRUNCATE is not allowed');
    const [unchanged] = await ctx.db.select().from(gaugeReadings).where(eq(gaugeReadings.id, reading.id));
    expect(unchanged).toEqual(reading);

    const second = await upload(technicianAgent, own.revisionId, goodCsv);
    expect(second.status).toBe(201);
    const saved = await ctx.db.select({ id: gaugeReadings.id }).from(gaugeReadings).where(eq(gaugeReadings.revisionId, own.revisionId));
    expect(saved).toHaveLength(8);
  });
});
