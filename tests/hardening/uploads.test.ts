/**
 * Hostile uploads: the PDF verification upload (multipart, field "file") and every other POST route
 * fed a multipart body. The declared file name is never used as a path (multer keeps uploads in
 * memory), the declared Content-Type is not trusted (the bytes must start with "%PDF-", ISO
 * 32000-1:2008 §7.5.2), size and part limits answer 413/400, and nothing answers 5xx.
 */
import { createHash } from 'node:crypto';
import { existsSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type TestAgent from 'supertest/lib/agent';
import { routeRegistry } from '../../server/http/define-route';
import { policy, PUBLIC, SIGNED_IN } from '../../server/auth/policy';
import { VERIFY_MAX_BYTES } from '../../server/features/sheets/verify-upload';
import type { Role } from '../../shared/schemas/roles';
import { createTestContext, type TestContext } from '../integration/helpers/test-app';
import { createTestUser, signedInAgent } from '../integration/helpers/users';

let ctx: TestContext;
const agents = new Map<Role, TestAgent>();
beforeAll(async () => {
  ctx = createTestContext();
  for (const role of ['administrator', 'engineer', 'technician', 'reviewer'] as const) agents.set(role, await signedInAgent(ctx.app, await createTestUser(ctx.db, { role })));
});
afterAll(async () => {
  await ctx.close();
});

const TRAVERSAL_NAMES = ['../../../../tmp/quietlayer-owned.pdf', '..\\..\\..\\quietlayer-owned.pdf', '/etc/passwd', '%2e%2e%2fquietlayer-owned.pdf', '<img src=x onerror=alert(1)>.pdf', 'x'.repeat(5000)];
const minimalPdf = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n', 'latin1');

describe('PDF verification upload', () => {
  it('treats a traversal file name as a label only: answers by content hash, writes no file', async () => {
    for (const filename of TRAVERSAL_NAMES) {
      const response = await agents.get('technician')!.post('/api/sheets/verify').attach('file', minimalPdf, { filename, contentType: 'application/pdf' });
      expect({ filename, status: response.status }).toEqual({ filename, status: 200 });
      expect(response.body).toEqual({ match: false, sha256: createHash('sha256').update(minimalPdf).digest('hex') });
    }
    expect(existsSync('/tmp/quietlayer-owned.pdf')).toBe(false);
    // A NUL byte in the part header makes the multipart body malformed: refused, not crashed.
    const nul = await agents.get('technician')!.post('/api/sheets/verify').attach('file', minimalPdf, { filename: 'a\u0000.pdf', contentType: 'application/pdf' });
    expect(nul.status).toBe(400);
  });

  it('judges the bytes, not the declared type: HTML labelled application/pdf is refused 422; a PDF labelled text/html is read', async () => {
    const html = Buffer.from('<html><script>window.__xss=1</script></html>');
    const disguised = await agents.get('technician')!.post('/api/sheets/verify').attach('file', html, { filename: 'sheet.pdf', contentType: 'application/pdf' });
    expect(disguised.status).toBe(422);
    expect(disguised.body.error.fields.file).toMatch(/not a PDF/);
    const relabelled = await agents.get('technician')!.post('/api/sheets/verify').attach('file', minimalPdf, { filename: 'sheet.html', contentType: 'text/html' });
    expect(relabelled.status).toBe(200);
  });

  it('refuses a file over the limit with 413, a second file or another field name with 400, and a non-multipart body with 400', async () => {
    const tooBig = Buffer.concat([minimalPdf, Buffer.alloc(VERIFY_MAX_BYTES + 1 - minimalPdf.length + 1, 0x20)]);
    const big = await agents.get('technician')!.post('/api/sheets/verify').attach('file', tooBig, { filename: 'big.pdf', contentType: 'application/pdf' });
    expect(big.status).toBe(413);
    expect(big.body.error.code).toBe('payload_too_large');

    const two = await agents.get('technician')!.post('/api/sheets/verify').attach('file', minimalPdf, 'a.pdf').attach('file', minimalPdf, 'b.pdf');
    expect(two.status).toBe(400);
    const otherField = await agents.get('technician')!.post('/api/sheets/verify').attach('document', minimalPdf, 'a.pdf');
    expect(otherField.status).toBe(400);
    const raw = await agents.get('technician')!.post('/api/sheets/verify').set('Content-Type', 'application/pdf').send(minimalPdf.toString('latin1'));
    expect(raw.status).toBe(400);
    const broken = await agents.get('technician')!.post('/api/sheets/verify').set('Content-Type', 'multipart/form-data; boundary=zzz').send('--zzz\r\nContent-Disposition: form-data; name="file"; filename="a.pdf"\r\n\r\n%PDF-1.4 no end');
    expect(broken.status).toBe(400);
  });
});

describe('every POST route given a multipart upload with a traversal name', () => {
  it('answers 4xx or 2xx, never 5xx (JSON routes refuse it; upload routes judge the bytes)', async () => {
    const failures: string[] = [];
    for (const route of [...routeRegistry.values()].filter((r) => r.method === 'post')) {
      const rule = policy[route.action];
      if (rule === PUBLIC) continue; // public routes take JSON only and are fuzzed in fuzz-api.test.ts
      const role: Role = rule === SIGNED_IN ? 'engineer' : (rule as readonly Role[])[0];
      const path = route.path.replace(/:(\w+)/g, '00000000-0000-4000-8000-000000000000');
      const response = await agents
        .get(role)!
        .post(path)
        .field('options', '{"__proto__":{"polluted":true}}')
        .attach('file', Buffer.from('=cmd|\' /C calc\'!A0,1,2\r\n../../etc/passwd,3,4\r\n'), { filename: '../../../../etc/passwd', contentType: 'text/csv' });
      if (response.status >= 500) failures.push(`${route.path} → ${response.status} ${response.text.slice(0, 120)}`);
    }
    expect(failures).toEqual([]);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});
