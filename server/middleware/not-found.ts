import type { RequestHandler } from 'express';

/** Unknown /api routes answer JSON, never the client's HTML. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `No API route ${req.method} ${req.path}.` } });
};
