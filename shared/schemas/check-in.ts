import { z } from 'zod';
import { LocalDateSchema } from './local-date';

/**
 * Answers that stop all playing until a clinician has reviewed them. Numbness, tingling, weakness and
 * loss of control need clinical review (Peabody Institute "Playing Well" guidance); night pain and a
 * hot swollen joint need urgent review (NHS England 2020, urgent MSK conditions for onward referral).
 */
export const RedFlagSchema = z.enum([
  'numbness',
  'tingling',
  'weakness',
  'loss_of_control',
  'night_pain',
  'swelling',
]);
export type RedFlag = z.infer<typeof RedFlagSchema>;
export const RED_FLAGS = RedFlagSchema.options;

/** Pain on the 0-10 numeric rating scale. */
export const PainScoreSchema = z.number().int().min(0).max(10);

export const GatePositionSchema = z.enum(['before', 'between', 'after']);
export type GatePosition = z.infer<typeof GatePositionSchema>;

/** One pain gate answered during a session: before it, after a given block, or after the session. */
export const GateAnswerSchema = z.object({
  position: GatePositionSchema,
  /** 1-based number of the block just played (for "between" and "after"). */
  afterBlock: z.number().int().min(1).optional(),
  pain: PainScoreSchema,
});
export type GateAnswer = z.infer<typeof GateAnswerSchema>;

/** What the musician records about one playing session. */
export const SessionCheckInSchema = z.object({
  kind: z.literal('session'),
  id: z.string().optional(),
  date: LocalDateSchema,
  /** 0-based session of that day. */
  sessionIndex: z.number().int().min(0).default(0),
  gates: z.array(GateAnswerSchema).default([]),
  redFlags: z.array(RedFlagSchema).default([]),
  /** Session effort on the CR-10 scale (Foster et al. 2001). */
  effort: z.number().min(0).max(10).optional(),
  minutesPlayed: z.number().int().min(0).max(24 * 60),
  note: z.string().max(2000).optional(),
  recordedAt: z.string().optional(),
});
export type SessionCheckIn = z.infer<typeof SessionCheckInSchema>;

/** What a pain answer outside the gates carries: when, how much, and any red flag. */
const painAnswer = {
  id: z.string().optional(),
  date: LocalDateSchema,
  pain: PainScoreSchema,
  redFlags: z.array(RedFlagSchema).default([]),
  note: z.string().max(2000).optional(),
  recordedAt: z.string().optional(),
};

/**
 * The next-morning check about the previous day's playing: symptoms may come later or the next day
 * (BAPAM, "Returning to Playing and Performance for Instrumental Musicians").
 */
export const NextMorningCheckInSchema = z.object({
  kind: z.literal('next_morning'),
  /** The morning's date; it reports on the day before. */
  ...painAnswer,
});
export type NextMorningCheckIn = z.infer<typeof NextMorningCheckInSchema>;

/**
 * Pain reported at any time, outside a session. Over the session threshold it counts like a failed gate
 * (no more playing that day; hold or step back); a red flag stops all playing.
 */
export const PainReportSchema = z.object({
  kind: z.literal('pain_report'),
  ...painAnswer,
});
export type PainReport = z.infer<typeof PainReportSchema>;

export const CheckInSchema = z.discriminatedUnion('kind', [
  SessionCheckInSchema,
  NextMorningCheckInSchema,
  PainReportSchema,
]);
export type CheckIn = z.infer<typeof CheckInSchema>;
export type CheckInInput = z.input<typeof CheckInSchema>;
