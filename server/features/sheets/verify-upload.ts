import type { Request, Response } from 'express';
import multer from 'multer';
import { AppError, BadRequestError, UnprocessableError } from '../../errors';

/** Largest PDF accepted for verification. */
export const VERIFY_MAX_BYTES = 20 * 1024 * 1024;

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: VERIFY_MAX_BYTES, files: 1, fields: 5 } }).single('file');

/** "%PDF-": every PDF file starts with these bytes (ISO 32000-1:2008 §7.5.2, file header). */
const PDF_MAGIC = Buffer.from('%PDF-', 'latin1');

/**
 * Reads one multipart upload (field "file") into memory, after the route has checked the session,
 * and accepts it only when its bytes start with "%PDF-" (the declared type is not trusted).
 */
export async function readPdfUpload(req: Request, res: Response): Promise<Buffer> {
  await new Promise<void>((resolve, reject) => {
    upload(req, res, (error: unknown) => {
      if (!error) return resolve();
      if (error instanceof multer.MulterError) {
        if (error.code === 'LIMIT_FILE_SIZE') {
          return reject(new AppError(413, 'payload_too_large', `The file is larger than ${VERIFY_MAX_BYTES / 1024 / 1024} MB.`, { file: `at most ${VERIFY_MAX_BYTES / 1024 / 1024} MB` }));
        }
        return reject(new BadRequestError(`The upload is not right: ${error.message}. Send one PDF in the form field "file".`, { file: error.message }));
      }
      reject(new BadRequestError('The upload could not be read. Send one PDF as multipart/form-data in the field "file".', { file: 'unreadable upload' }));
    });
  });
  const file = req.file;
  if (!file) throw new BadRequestError('Attach the PDF as multipart/form-data in the field "file".', { file: 'file is required' });
  if (file.buffer.length < PDF_MAGIC.length || !file.buffer.subarray(0, PDF_MAGIC.length).equals(PDF_MAGIC)) {
    throw new UnprocessableError('This file is not a PDF: it does not start with "%PDF-".', { file: 'not a PDF (it does not start with %PDF-)' });
  }
  return file.buffer;
}
