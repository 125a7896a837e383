import { useMutation, useQueryClient } from '@tanstack/react-query';
import { fluidCsvCommitResultSchema, fluidCsvPreviewSchema } from '../../../../shared/schemas/fluids';
import { api, buildApiUrl } from '../../../lib/api-client';

export function previewFluidCsv(csv: string) {
  return api.post('/fluids/import/preview', { csv }, { schema: fluidCsvPreviewSchema });
}

/** All rows or none: the server saves every fluid in one transaction or refuses the file. */
export function commitFluidCsv(csv: string) {
  return api.post('/fluids/import/commit', { csv }, { schema: fluidCsvCommitResultSchema });
}

export const usePreviewFluidCsv = () => useMutation({ mutationFn: previewFluidCsv });

export function useCommitFluidCsv() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: commitFluidCsv, onSuccess: () => queryClient.invalidateQueries({ queryKey: ['fluids'] }) });
}

/** The export is a plain download link (the session cookie goes with it). */
export const fluidsCsvExportUrl = buildApiUrl('/fluids/export.csv');
