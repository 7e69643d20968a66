import type { z } from 'zod';
import type { CreatePieceSchema, PieceRecord } from '@/shared/schemas/repertoire';

export type PieceFormValues = z.input<typeof CreatePieceSchema>;

export const emptyPiece: PieceFormValues = { title: '', composer: '', tier: 'easy', passages: [], onProgramme: true };

export const pieceValues = (piece: PieceRecord): PieceFormValues => ({
  title: piece.title,
  composer: piece.composer,
  tier: piece.tier,
  passages: piece.passages.map((p) => ({ bars: p.bars, demands: [...p.demands] })),
  onProgramme: piece.onProgramme,
});
