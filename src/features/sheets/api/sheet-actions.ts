import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  sheetDetailSchema,
  type CreateSheetInput,
  type ReturnSheetInput,
  type ReviseSheetInput,
  type SignSheetInput,
} from '../../../../shared/schemas/sheets';
import { api } from '../../../lib/api-client';

const base = (id: string) => `/sheets/${encodeURIComponent(id)}`;

export const createSheet = (input: CreateSheetInput) => api.post('/sheets', input, { schema: sheetDetailSchema });
export const submitSheet = (id: string) => api.post(`${base(id)}/submit`, {}, { schema: sheetDetailSchema });
export const returnSheet = ({ id, input }: { id: string; input: ReturnSheetInput }) => api.post(`${base(id)}/return`, input, { schema: sheetDetailSchema });
export const signSheet = ({ id, input }: { id: string; input: SignSheetInput }) => api.post(`${base(id)}/sign`, input, { schema: sheetDetailSchema });
export const reviseSheet = ({ id, input }: { id: string; input: ReviseSheetInput }) => api.post(`${base(id)}/revisions`, input, { schema: sheetDetailSchema });

/** Every sheet change also changes lists, the outbox and the audit trail. */
function useSheetMutation<I, O>(mutationFn: (input: I) => Promise<O>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['sheets'] }),
        queryClient.invalidateQueries({ queryKey: ['outbox'] }),
        queryClient.invalidateQueries({ queryKey: ['audit'] }),
      ]),
  });
}

export const useCreateSheet = () => useSheetMutation(createSheet);
export const useSubmitSheet = () => useSheetMutation(submitSheet);
export const useReturnSheet = () => useSheetMutation(returnSheet);
export const useSignSheet = () => useSheetMutation(signSheet);
export const useReviseSheet = () => useSheetMutation(reviseSheet);
