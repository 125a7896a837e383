import { z } from 'zod';
import {
  createSheetInputSchema,
  returnSheetInputSchema,
  reviseSheetInputSchema,
  sheetListQuerySchema,
  signSheetInputSchema,
} from '../../../shared/schemas/sheets';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import {
  createSheet,
  getSheet,
  getSheetFilters,
  getSheetPdf,
  listSheets,
  returnSheet,
  reviseSheet,
  signSheet,
  submitSheet,
  verifySheetPdf,
} from './sheets.service';
import { readPdfUpload } from './verify-upload';

const sheetIdParamsSchema = z.object({ id: z.uuid({ error: 'id must be a process sheet id' }) });
const pdfQuerySchema = z.object({ download: z.enum(['0', '1', 'true', 'false']).optional() });

/** Process sheet routes (bodies and answers: shared/schemas/sheets.ts). */
export function registerSheetsRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'get',
    path: '/api/sheets',
    action: 'sheets.read',
    handler: async (req, res, ctx) => {
      const query = sheetListQuerySchema.parse(req.query);
      const { items, total } = await listSheets(ctx.db, query);
      res.json({ items, total, page: query.page, pageSize: query.pageSize });
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/sheets/filters',
    action: 'sheets.read',
    handler: async (_req, res, ctx) => {
      res.json(await getSheetFilters(ctx.db));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/sheets',
    action: 'sheets.create',
    handler: async (req, res, ctx) => {
      const input = createSheetInputSchema.parse(req.body);
      res.status(201).json(await createSheet(ctx.db, ctx.user, input, { requestId: ctx.requestId }));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/sheets/verify',
    action: 'sheets.verify',
    handler: async (req, res, ctx) => {
      const bytes = await readPdfUpload(req, res);
      res.json(await verifySheetPdf(ctx.db, ctx.user, bytes, { requestId: ctx.requestId }));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/sheets/:id',
    action: 'sheets.read',
    handler: async (req, res, ctx) => {
      const { id } = sheetIdParamsSchema.parse(req.params);
      res.json(await getSheet(ctx.db, ctx.user, id));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/sheets/:id/pdf',
    action: 'sheets.read',
    handler: async (req, res, ctx) => {
      const { id } = sheetIdParamsSchema.parse(req.params);
      const { download } = pdfQuerySchema.parse(req.query);
      const pdf = await getSheetPdf(ctx.db, ctx.env, id);
      const disposition = download === '1' || download === 'true' ? 'attachment' : 'inline';
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `${disposition}; filename="${pdf.filename}"`);
      res.setHeader('Cache-Control', pdf.signed ? 'private, max-age=3600' : 'no-store');
      res.send(pdf.bytes);
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/sheets/:id/submit',
    action: 'sheets.submit',
    handler: async (req, res, ctx) => {
      const { id } = sheetIdParamsSchema.parse(req.params);
      res.json(await submitSheet(ctx.db, ctx.env, ctx.user, id, { requestId: ctx.requestId }));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/sheets/:id/return',
    action: 'sheets.return',
    handler: async (req, res, ctx) => {
      const { id } = sheetIdParamsSchema.parse(req.params);
      const input = returnSheetInputSchema.parse(req.body);
      res.json(await returnSheet(ctx.db, ctx.env, ctx.user, id, input, { requestId: ctx.requestId }));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/sheets/:id/sign',
    action: 'sheets.sign',
    handler: async (req, res, ctx) => {
      const { id } = sheetIdParamsSchema.parse(req.params);
      const input = signSheetInputSchema.parse(req.body);
      res.json(await signSheet(ctx.db, ctx.env, ctx.user, id, input, { requestId: ctx.requestId }));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/sheets/:id/revisions',
    action: 'sheets.create',
    handler: async (req, res, ctx) => {
      const { id } = sheetIdParamsSchema.parse(req.params);
      const input = reviseSheetInputSchema.parse(req.body ?? {});
      res.status(201).json(await reviseSheet(ctx.db, ctx.user, id, input, { requestId: ctx.requestId }));
    },
  });
}
