import { z } from 'zod';
import { LocalDateSchema } from './local-date';

/**
 * A clinician's decision that changes the progression. Every one is kept and shown in the history.
 * `hold` stops progression until `resume` or `advance`; `clear_red_flag` lets playing restart.
 */
export const OverrideActionSchema = z.enum([
  'advance',
  'hold',
  'resume',
  'step_back',
  'clear_red_flag',
]);
export type OverrideAction = z.infer<typeof OverrideActionSchema>;

export const OverrideSchema = z.object({
  id: z.string().optional(),
  action: OverrideActionSchema,
  /** The plan date it takes effect on (applied after that day's check-ins). */
  date: LocalDateSchema,
  reason: z.string().trim().min(1, 'Give a reason'),
  /** Who decided (clinician name or id). */
  by: z.string().trim().min(1),
  /** When it was recorded (ISO date-time); orders several overrides on one day. */
  at: z.string().min(1),
});
export type Override = z.infer<typeof OverrideSchema>;
