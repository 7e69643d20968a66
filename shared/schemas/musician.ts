import { z } from 'zod';
import { LocalDateSchema } from './local-date';
import { PlanOverviewSchema, ProgressionStatusSchema } from './plan-overview';

/** Something the clinician should look at first: red flags, failed gates, plans out of reach, load spikes. */
export const CaseloadAlertSchema = z.object({
  kind: z.enum(['red_flag', 'failed_gate', 'infeasible', 'load_warning']),
  severity: z.enum(['urgent', 'warning']),
  message: z.string(),
  date: LocalDateSchema.nullable(),
});
export type CaseloadAlert = z.infer<typeof CaseloadAlertSchema>;

/** The plan's progression status, or `no_plan` while no version is active. */
export const CaseloadStatusSchema = z.enum([...ProgressionStatusSchema.options, 'no_plan']);
export type CaseloadStatus = z.infer<typeof CaseloadStatusSchema>;

/** A musician in a clinician's caseload. `joined` is false while the invitation is still open. */
export const CaseloadEntrySchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  instrument: z.string(),
  joined: z.boolean(),
  createdAt: z.string(),
  plan: PlanOverviewSchema.nullable(),
  status: CaseloadStatusSchema.default('no_plan'),
  lastCheckInDate: LocalDateSchema.nullable().default(null),
  /** Urgent first; empty when nothing needs attention. */
  alerts: z.array(CaseloadAlertSchema).default([]),
});
export type CaseloadEntry = z.infer<typeof CaseloadEntrySchema>;

/** What a musician's landing screen shows about themselves. `plan` is null until a plan is active. */
export const MusicianHomeSchema = z.object({
  id: z.string(),
  name: z.string(),
  instrument: z.string(),
  clinicianName: z.string(),
  plan: PlanOverviewSchema.nullable(),
});
export type MusicianHome = z.infer<typeof MusicianHomeSchema>;

/** Query of GET /api/musicians: order and filter (the list is also small enough to sort on the client). */
export const CaseloadQuerySchema = z.object({
  sort: z.enum(['name', 'alerts', 'event', 'last_check_in']).default('name'),
  status: CaseloadStatusSchema.optional(),
  alerts: z.enum(['only']).optional(),
});
export type CaseloadQuery = z.infer<typeof CaseloadQuerySchema>;

/** A teacher's student in their list: only what is needed to find them, nothing medical. */
export { StudentSummarySchema as StudentSchema, type StudentSummary as Student } from './clearance';
