import { useMutation } from '@tanstack/react-query';
import { verifyResultSchema, type VerifyResult } from '../../../../shared/schemas/sheets';
import { ApiError, toApiError } from '../../../lib/api-client';

/** Uploads a PDF (multipart, field "file") and asks which signed sheet it is. */
export async function verifySheetPdf(file: File): Promise<VerifyResult> {
  const form = new FormData();
  form.append('file', file);
  let response: Response;
  try {
    response = await fetch('/api/sheets/verify', { method: 'POST', body: form, credentials: 'same-origin', headers: { Accept: 'application/json' } });
  } catch {
    throw new ApiError({ status: 0, code: 'network_error', message: 'QuietLayer could not reach its server. Check the connection and try again.' });
  }
  const text = await response.text();
  let body: unknown;
  try {
    body = text ? JSON.parse(text) : undefined;
  } catch {
    body = undefined;
  }
  if (!response.ok) throw toApiError(response.status, body);
  return verifyResultSchema.parse(body);
}

export const useVerifySheetPdf = () => useMutation({ mutationFn: verifySheetPdf });
