import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  batchSummarySchema,
  gaugeNoteSchema,
  issuedGaugeTokenSchema,
  uploadPreviewSchema,
  type CloseNoteInput,
  type UploadOptions,
} from '../../../../shared/schemas/gauge-log';
import { api, ApiError, toApiError } from '../../../lib/api-client';

/** Multipart upload (the JSON client does not send files): `file` plus the options as JSON text. */
async function postUpload(path: string, file: File, options: UploadOptions): Promise<unknown> {
  const form = new FormData();
  form.append('options', JSON.stringify(options));
  form.append('file', file);
  let response: Response;
  try {
    response = await fetch(`/api${path}`, { method: 'POST', body: form, credentials: 'same-origin', headers: { Accept: 'application/json' } });
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
  if (!response.ok) {
    const error = toApiError(response.status, body) as ApiError & { rowErrors?: { line: number; column: string | null; message: string }[] };
    const rows = (body as { errors?: unknown } | undefined)?.errors;
    if (Array.isArray(rows)) error.rowErrors = rows as typeof error.rowErrors;
    throw error;
  }
  return body;
}

const uploadBase = (revisionId: string) => `/gauge/released/${encodeURIComponent(revisionId)}/uploads`;

export const previewUpload = async ({ revisionId, file, options }: { revisionId: string; file: File; options: UploadOptions }) =>
  uploadPreviewSchema.parse(await postUpload(`${uploadBase(revisionId)}/preview`, file, options));

export const commitUpload = async ({ revisionId, file, options }: { revisionId: string; file: File; options: UploadOptions }) =>
  batchSummarySchema.parse(await postUpload(uploadBase(revisionId), file, options));

function useGaugeMutation<I, O>(mutationFn: (input: I) => Promise<O>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    onSettled: () => Promise.all([queryClient.invalidateQueries({ queryKey: ['gauge'] }), queryClient.invalidateQueries({ queryKey: ['outbox'] })]),
  });
}

export const usePreviewUpload = () => useMutation({ mutationFn: previewUpload });
export const useCommitUpload = () => useGaugeMutation(commitUpload);
export const useIssueToken = () =>
  useGaugeMutation(({ revisionId, label }: { revisionId: string; label: string }) => api.post('/gauge/tokens', { revisionId, label }, { schema: issuedGaugeTokenSchema }));
export const useRevokeToken = () => useGaugeMutation((id: string) => api.post(`/gauge/tokens/${encodeURIComponent(id)}/revoke`, {}));
export const useDispositionNote = () =>
  useGaugeMutation(({ id, disposition }: { id: string; disposition: string }) =>
    api.post(`/gauge/notes/${encodeURIComponent(id)}/disposition`, { disposition }, { schema: gaugeNoteSchema }),
  );
export const useCloseNote = () =>
  useGaugeMutation(({ id, input }: { id: string; input: CloseNoteInput }) => api.post(`/gauge/notes/${encodeURIComponent(id)}/close`, input, { schema: gaugeNoteSchema }));
