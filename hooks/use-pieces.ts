import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '@/lib/api-client';
import { PieceRecordSchema, type CreatePiece, type UpdatePiece } from '@/shared/schemas/repertoire';

export const pieceKeys = { list: (id: string) => ['pieces', id] as const };

const base = (id: string) => `/api/musicians/${encodeURIComponent(id)}/pieces`;

export function usePiecesQuery(id: string) {
  return useQuery({ queryKey: pieceKeys.list(id), queryFn: ({ signal }) => api(base(id), { schema: z.array(PieceRecordSchema), signal }) });
}

export function useSavePieceMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ pieceId, body }: { pieceId?: string; body: CreatePiece | UpdatePiece }) =>
      pieceId
        ? api(`${base(id)}/${encodeURIComponent(pieceId)}`, { method: 'PATCH', body, schema: PieceRecordSchema })
        : api(base(id), { method: 'POST', body, schema: PieceRecordSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: pieceKeys.list(id) }),
  });
}

export function useDeletePieceMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (pieceId: string) => api(`${base(id)}/${encodeURIComponent(pieceId)}`, { method: 'DELETE', schema: z.null() }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: pieceKeys.list(id) }),
  });
}
