import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { DocumentSchema } from '@/shared/schemas/document';

export const myDocumentKeys = {
  all: ['my-documents'] as const,
  list: () => [...myDocumentKeys.all, 'list'] as const,
};

/** Documents the musician's clinician shared with them (letters, handouts, setup photos). */
export function useMyDocumentsQuery() {
  return useQuery({
    queryKey: myDocumentKeys.list(),
    queryFn: ({ signal }) => api('/api/documents', { schema: z.array(DocumentSchema), signal }),
  });
}

export function myDocumentHref(id: string): string {
  return `/api/documents/${encodeURIComponent(id)}/file`;
}
