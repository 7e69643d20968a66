import { z } from 'zod';

/**
 * Repertoire difficulty, in the order a graded return unlocks it: simple, slow and soft music first,
 * technical difficulty last (Norris 1996, Work 7(2):89-93; Butler & Norris 2011).
 */
export const TierSchema = z.enum(['easy', 'moderate', 'demanding']);
export type Tier = z.infer<typeof TierSchema>;
export const TIERS = TierSchema.options;

/** What makes a passage demanding on the body. */
export const DemandSchema = z.enum(['speed', 'loudness', 'range', 'stretch', 'endurance']);
export type Demand = z.infer<typeof DemandSchema>;

export const PassageSchema = z.object({
  /** Free text, e.g. "bars 112-140". */
  bars: z.string().trim().min(1, 'Say which bars'),
  demands: z.array(DemandSchema).min(1, 'Pick at least one demand'),
});
export type Passage = z.infer<typeof PassageSchema>;

export const PieceSchema = z.object({
  id: z.string().optional(),
  title: z.string().trim().min(1, 'Give the title'),
  composer: z.string().trim().default(''),
  tier: TierSchema,
  passages: z.array(PassageSchema).default([]),
  /** On the programme of the target event (used for the reduced programme). */
  onProgramme: z.boolean().default(false),
});
export type Piece = z.infer<typeof PieceSchema>;
export type PieceInput = z.input<typeof PieceSchema>;
