import type { Response } from 'express';
import { z } from 'zod';
import {
  archiveFluidInputSchema,
  duplicateFluidInputSchema,
  fluidCsvImportInputSchema,
  fluidInputSchema,
  fluidListQuerySchema,
  updateFluidInputSchema,
} from '../../../shared/schemas/fluids';
import { defineRoute, type ApiRouter } from '../../http/define-route';
import {
  commitFluidCsv,
  createFluid,
  duplicateFluid,
  exportFluidsCsv,
  getFluid,
  listFluids,
  previewFluidCsv,
  setFluidArchived,
  updateFluid,
} from './fluids.service';
import { StaleVersionError } from './stale-version-error';

const fluidIdParamsSchema = z.object({ id: z.uuid({ error: 'id must be a fluid id' }) });

/**
 * Answers a stale save with 409, the usual error body and `current` (the record as it is now);
 * anything else goes on to the error handler.
 */
export async function answeringStaleVersion(res: Response, work: () => Promise<void>): Promise<void> {
  try {
    await work();
  } catch (error) {
    if (error instanceof StaleVersionError) {
      res.status(409).json({ error: { code: error.code, message: error.message, fields: error.fields }, current: error.current });
      return;
    }
    throw error;
  }
}

/** Fluid library routes (see shared/schemas/fluids.ts for bodies and answers). */
export function registerFluidsRoutes(api: ApiRouter): void {
  defineRoute(api, {
    method: 'get',
    path: '/api/fluids',
    action: 'fluids.read',
    handler: async (req, res, ctx) => {
      const query = fluidListQuerySchema.parse(req.query);
      const { items, total } = await listFluids(ctx.db, query);
      res.json({ items, total, page: query.page, pageSize: query.pageSize });
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/fluids/export.csv',
    action: 'fluids.read',
    handler: async (_req, res, ctx) => {
      const csv = await exportFluidsCsv(ctx.db);
      res.setHeader('Content-Type', 'text/csv; charset=utf-8');
      res.setHeader('Content-Disposition', 'attachment; filename="quietlayer-fluids.csv"');
      res.send(csv);
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/fluids/import/preview',
    action: 'fluids.write',
    handler: async (req, res) => {
      const { csv } = fluidCsvImportInputSchema.parse(req.body);
      res.json(previewFluidCsv(csv));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/fluids/import/commit',
    action: 'fluids.write',
    handler: async (req, res, ctx) => {
      const { csv } = fluidCsvImportInputSchema.parse(req.body);
      res.status(201).json(await commitFluidCsv(ctx.db, ctx.user, csv, { requestId: ctx.requestId }));
    },
  });

  defineRoute(api, {
    method: 'get',
    path: '/api/fluids/:id',
    action: 'fluids.read',
    handler: async (req, res, ctx) => {
      const { id } = fluidIdParamsSchema.parse(req.params);
      res.json(await getFluid(ctx.db, id));
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/fluids',
    action: 'fluids.write',
    handler: async (req, res, ctx) => {
      const input = fluidInputSchema.parse(req.body);
      res.status(201).json(await createFluid(ctx.db, ctx.user, input, { requestId: ctx.requestId }));
    },
  });

  defineRoute(api, {
    method: 'put',
    path: '/api/fluids/:id',
    action: 'fluids.write',
    handler: async (req, res, ctx) => {
      const { id } = fluidIdParamsSchema.parse(req.params);
      const input = updateFluidInputSchema.parse(req.body);
      await answeringStaleVersion(res, async () => {
        res.json(await updateFluid(ctx.db, ctx.user, id, input, { requestId: ctx.requestId }));
      });
    },
  });

  defineRoute(api, {
    method: 'post',
    path: '/api/fluids/:id/duplicate',
    action: 'fluids.write',
    handler: async (req, res, ctx) => {
      const { id } = fluidIdParamsSchema.parse(req.params);
      const { name } = duplicateFluidInputSchema.parse(req.body ?? {});
      res.status(201).json(await duplicateFluid(ctx.db, ctx.user, id, { name }, { requestId: ctx.requestId }));
    },
  });

  for (const [verb, archived] of [['archive', true], ['restore', false]] as const) {
    defineRoute(api, {
      method: 'post',
      path: `/api/fluids/:id/${verb}`,
      action: 'fluids.write',
      handler: async (req, res, ctx) => {
        const { id } = fluidIdParamsSchema.parse(req.params);
        const { version } = archiveFluidInputSchema.parse(req.body);
        await answeringStaleVersion(res, async () => {
          res.json(await setFluidArchived(ctx.db, ctx.user, id, { archived, version }, { requestId: ctx.requestId }));
        });
      },
    });
  }
}
