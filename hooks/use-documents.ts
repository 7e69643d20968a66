import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api, apiUpload } from '@/lib/api-client';
import { DocumentSchema, type UpdateDocument } from '@/shared/schemas/document';

export const documentKeys = { list: (id: string) => ['documents', id] as const };

export const documentsPath = (id: string) => `/api/musicians/${encodeURIComponent(id)}/documents`;

export function useDocumentsQuery(id: string) {
  return useQuery({ queryKey: documentKeys.list(id), queryFn: ({ signal }) => api(documentsPath(id), { schema: z.array(DocumentSchema), signal }) });
}

/** Multipart: `file`, `title`, `visibility`. 413 and 415 come back as ApiErrors with plain words. */
export function useUploadDocumentMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (form: FormData) => apiUpload(documentsPath(id), { body: form, schema: DocumentSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: documentKeys.list(id) }),
  });
}

export function useUpdateDocumentMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ docId, body }: { docId: string; body: UpdateDocument }) =>
      api(`${documentsPath(id)}/${encodeURIComponent(docId)}`, { method: 'PATCH', body, schema: DocumentSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: documentKeys.list(id) }),
  });
}

export function useDeleteDocumentMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (docId: string) => api(`${documentsPath(id)}/${encodeURIComponent(docId)}`, { method: 'DELETE', schema: z.null() }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: documentKeys.list(id) }),
  });
}
