import {
  closeNoteInputSchema,
  createGaugeTokenInputSchema,
  devicePostInputSchema,
  dispositionInputSchema,
  gaugeNoteListQuerySchema,
  gaugeTokenListQuerySchema,
  idParamsSchema,
  readingListQuerySchema,
  releasedCheckListQuerySchema,
  revisionParamsSchema,
  seriesQuerySchema,
  spotsQuerySchema,
} from '../../../shared/schemas/gauge-log';
import { pageQuerySchema } from '../../../shared/schemas/api-error';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import { UnprocessableError } from '../../errors';
import { closeNote, dispositionNote, getNote, listNotes } from './gauge-notes.service';
import {
  countFlags,
  exportReadingsCsv,
  getGaugeWindow,
  getReadingSeries,
  getSpots,
  judgeReadings,
  listBatches,
  listReadings,
  listReleasedChecks,
  listRunSummaries,
  loadRevision,
  saveReadingBatch,
  toBatchSummary,
} from './gauge-readings.service';
import { authenticateGaugeToken, issueGaugeToken, listGaugeTokens, postDeviceReadings, revokeGaugeToken } from './gauge-tokens.service';
import { parseUpload, previewOf, receiveUpload } from './gauge-uploads';

const PREVIEW_JUDGED_ROWS = 20;

/** Gauge log routes (contract: shared/schemas/gauge-log.ts). */
export function registerGaugeLogRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'get',
    path: '/api/gauge/released',
    action: 'gauge.read',
    handler: async (req, res, ctx) => {
      res.json(await listReleasedChecks(ctx.db, releasedCheckListQuerySchema.parse(req.query)));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/gauge/released/:revisionId',
    action: 'gauge.read',
    handler: async (req, res, ctx) => {
      const { revisionId } = revisionParamsSchema.parse(req.params);
      res.json(await getGaugeWindow(ctx.db, revisionId));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/gauge/released/:revisionId/uploads/preview',
    action: 'gauge.upload',
    handler: async (req, res, ctx) => {
      const { revisionId } = revisionParamsSchema.parse(req.params);
      const context = await loadRevision(ctx.db, revisionId, { released: true });
      const { text, fileName, options } = await receiveUpload(req, res);
      const parsed = parseUpload(text, options);
      const judgedAll = judgeReadings(context, parsed.result.readings);
      res.json(previewOf(fileName, parsed, judgedAll.slice(0, PREVIEW_JUDGED_ROWS), countFlags(judgedAll)));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/gauge/released/:revisionId/uploads',
    action: 'gauge.upload',
    handler: async (req, res, ctx) => {
      const { revisionId } = revisionParamsSchema.parse(req.params);
      const context = await loadRevision(ctx.db, revisionId, { released: true });
      const { text, fileName, options } = await receiveUpload(req, res);
      const parsed = parseUpload(text, options);
      const mappingErrors = parsed.result.mappingErrors as Record<string, string>;
      if (Object.keys(mappingErrors).length > 0) {
        throw new UnprocessableError('The column mapping needs attention; nothing was saved.', prefix(mappingErrors, 'options.'));
      }
      if (parsed.result.errors.length > 0) {
        const lines = [...new Set(parsed.result.errors.map((e) => e.line))];
        const fields: Record<string, string> = {};
        for (const e of parsed.result.errors) fields[`line ${e.line}${e.column ? `, ${e.column}` : ''}`] ??= e.message;
        res.status(422).json({
          error: {
            code: 'unprocessable',
            message: `${parsed.errorCount} problem${parsed.errorCount === 1 ? '' : 's'} on line${lines.length === 1 ? '' : 's'} ${lines.slice(0, 10).join(', ')}${lines.length > 10 ? ', …' : ''}; nothing was saved.`,
            fields,
          },
          errors: parsed.result.errors,
        });
        return;
      }
      const batch = await saveReadingBatch(
        ctx.db,
        context,
        parsed.result.readings,
        {
          source: 'upload',
          uploadedBy: ctx.user.id,
          fileName,
          gaugeType: options.gaugeType ?? null,
          calibrationDate: options.calibrationDate ?? null,
          thicknessBasis: options.thicknessBasis,
          volumeSolids: options.volumeSolidsPercent === undefined ? null : options.volumeSolidsPercent / 100,
          thinner: options.thinnerPercent / 100,
          defaultOperator: options.operator ?? ctx.user.displayName,
        },
        { actor: { id: ctx.user.id, email: ctx.user.email }, requestId: ctx.requestId, publicUrl: ctx.env.PUBLIC_URL },
      );
      res.status(201).json(toBatchSummary(batch));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/gauge/released/:revisionId/batches',
    action: 'gauge.read',
    handler: async (req, res, ctx) => {
      const { revisionId } = revisionParamsSchema.parse(req.params);
      res.json(await listBatches(ctx.db, revisionId, pageQuerySchema.parse(req.query)));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/gauge/released/:revisionId/readings',
    action: 'gauge.read',
    handler: async (req, res, ctx) => {
      const { revisionId } = revisionParamsSchema.parse(req.params);
      res.json(await listReadings(ctx.db, revisionId, readingListQuerySchema.parse(req.query)));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/gauge/released/:revisionId/series',
    action: 'gauge.read',
    handler: async (req, res, ctx) => {
      const { revisionId } = revisionParamsSchema.parse(req.params);
      const { run } = seriesQuerySchema.parse(req.query);
      res.json(await getReadingSeries(ctx.db, revisionId, run));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/gauge/released/:revisionId/runs',
    action: 'gauge.read',
    handler: async (req, res, ctx) => {
      const { revisionId } = revisionParamsSchema.parse(req.params);
      res.json(await listRunSummaries(ctx.db, revisionId));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/gauge/released/:revisionId/spots',
    action: 'gauge.read',
    handler: async (req, res, ctx) => {
      const { revisionId } = revisionParamsSchema.parse(req.params);
      res.json(await getSpots(ctx.db, revisionId, spotsQuerySchema.parse(req.query)));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/gauge/released/:revisionId/export.csv',
    action: 'gauge.read',
    handler: async (req, res, ctx) => {
      const { revisionId } = revisionParamsSchema.parse(req.params);
      const { run, flag } = readingListQuerySchema.parse(req.query);
      const { csv, fileName } = await exportReadingsCsv(ctx.db, revisionId, { run, flag });
      res.setHeader('Content-Type', 'text/csv; charset=utf-8');
      res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
      res.send(csv);
    },
  });

  // Device tokens (engineers)
  defineRoute(api, {
    method: 'get',
    path: '/api/gauge/tokens',
    action: 'gauge.tokens',
    handler: async (req, res, ctx) => {
      const { revisionId } = gaugeTokenListQuerySchema.parse(req.query);
      res.json(await listGaugeTokens(ctx.db, revisionId));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/gauge/tokens',
    action: 'gauge.tokens',
    handler: async (req, res, ctx) => {
      const input = createGaugeTokenInputSchema.parse(req.body);
      res.status(201).json(await issueGaugeToken(ctx.db, ctx.user, input, ctx.requestId));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/gauge/tokens/:id/revoke',
    action: 'gauge.tokens',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      await revokeGaugeToken(ctx.db, ctx.user, id, ctx.requestId);
      res.status(204).end();
    },
  });

  // The gauge itself posts here. PUBLIC in the policy: it authenticates by its bearer token (no cookie).
  defineRoute(api, {
    method: 'post',
    path: '/api/gauge/readings',
    action: 'gauge.device-post',
    handler: async (req, res, ctx) => {
      const token = await authenticateGaugeToken(ctx.db, req);
      const input = devicePostInputSchema.parse(req.body);
      const { status, body } = await postDeviceReadings(ctx.db, token, input, { requestId: ctx.requestId, publicUrl: ctx.env.PUBLIC_URL });
      res.status(status).json(body);
    },
  });

  // Nonconformance notes
  defineRoute(api, {
    method: 'get',
    path: '/api/gauge/notes',
    action: 'gauge.read',
    handler: async (req, res, ctx) => {
      res.json(await listNotes(ctx.db, ctx.user, gaugeNoteListQuerySchema.parse(req.query)));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/gauge/notes/:id',
    action: 'gauge.read',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      res.json(await getNote(ctx.db, ctx.user, id));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/gauge/notes/:id/disposition',
    action: 'gauge.notes.disposition',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      res.json(await dispositionNote(ctx.db, ctx.user, id, dispositionInputSchema.parse(req.body), ctx.requestId));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/gauge/notes/:id/close',
    action: 'gauge.notes.close',
    handler: async (req, res, ctx) => {
      const { id } = idParamsSchema.parse(req.params);
      res.json(await closeNote(ctx.db, ctx.user, id, closeNoteInputSchema.parse(req.body), { requestId: ctx.requestId, publicUrl: ctx.env.PUBLIC_URL }));
    },
  });
}

function prefix(fields: Record<string, string>, p: string): Record<string, string> {
  return Object.fromEntries(Object.entries(fields).map(([k, v]) => [`${p}${k}`, v]));
}
