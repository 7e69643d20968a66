import { z } from 'zod';
import { PlanOverviewSchema } from './plan-overview';

/** A musician in a clinician's caseload. `joined` is false while the invitation is still open. */
export const CaseloadEntrySchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  instrument: z.string(),
  joined: z.boolean(),
  createdAt: z.string(),
  plan: PlanOverviewSchema.nullable(),
});
export type CaseloadEntry = z.infer<typeof CaseloadEntrySchema>;

/** A teacher's student: only what is needed to find them, nothing medical. */
export const StudentSchema = z.object({
  id: z.string(),
  name: z.string(),
  instrument: z.string(),
});
export type Student = z.infer<typeof StudentSchema>;

/** What a musician's landing screen shows about themselves. `plan` is null until a plan is active. */
export const MusicianHomeSchema = z.object({
  id: z.string(),
  name: z.string(),
  instrument: z.string(),
  clinicianName: z.string(),
  plan: PlanOverviewSchema.nullable(),
});
export type MusicianHome = z.infer<typeof MusicianHomeSchema>;
