import { asc, desc, eq } from 'drizzle-orm';
import { addDays, gateWhere, planSummary, progressionState, redFlagWords, spokenDate, type PlanSummary } from '../../shared/scheduler';
import type { CaseloadAlert, CaseloadEntry, CaseloadQuery } from '../../shared/schemas/musician';
import type { Db } from '../db/client';
import { keptWhileUnchanged } from '../db/data-generation';
import { checkIns, musicians } from '../db/schema';
import { cachedPart, fingerprints, type CachedPart } from './caseload-cache';
import { overThreshold } from './check-in.service';
import { ownMusician, type MusicianRow } from './own-musician';
import { loadActivePlan } from './plan.service';
import { toOverview } from './plan-overview';

// Failed gates stay on the caseload for a week: long enough to be seen at the next weekly review.
const RECENT_DAYS = 7;

type Loaded = NonNullable<ReturnType<typeof loadActivePlan>>;

function worstPain(checkIn: Loaded['checkIns'][number]): string {
  if (checkIn.kind === 'next_morning') return `pain ${checkIn.pain} the next morning`;
  if (checkIn.kind === 'pain_report') return `pain ${checkIn.pain} reported outside a session`;
  const worst = [...checkIn.gates].sort((a, b) => b.pain - a.pain)[0];
  return worst ? `pain ${worst.pain} ${gateWhere(worst)}` : 'pain';
}

/** What needs the clinician's attention, urgent first; every message comes from the engine's results. */
function alertsFor(loaded: Loaded, summary: PlanSummary, now: Date): CaseloadAlert[] {
  const state = progressionState({ ...loaded, today: now });
  const alerts: CaseloadAlert[] = [];
  if (state.stoppedSince) {
    alerts.push({
      kind: 'red_flag',
      severity: 'urgent',
      message: `Red flag (${redFlagWords(state.redFlags)}) since ${spokenDate(state.stoppedSince)}: playing stopped until reviewed.`,
      date: state.stoppedSince,
    });
  }
  const since = addDays(state.today, -(RECENT_DAYS - 1));
  const failed = loaded.checkIns.filter((c) => c.date >= since && overThreshold(c, loaded.settings.painThreshold));
  const latest = failed.at(-1);
  if (latest) {
    const days = new Set(failed.map((c) => c.date)).size;
    alerts.push({
      kind: 'failed_gate',
      severity: 'warning',
      message: `Pain over the threshold on ${days} day${days === 1 ? '' : 's'} this week; latest ${spokenDate(latest.date)}: ${worstPain(latest)}.`,
      date: latest.date,
    });
  }
  if (!summary.feasible) {
    alerts.push({
      kind: 'infeasible',
      severity: 'warning',
      message: `Out of reach: ${summary.daysShort} days short of ${summary.event.name} on ${spokenDate(summary.event.date)}.`,
      date: summary.event.date,
    });
  }
  if (summary.loadWarning.message) {
    alerts.push({ kind: 'load_warning', severity: 'warning', message: summary.loadWarning.message, date: state.today });
  }
  return alerts;
}

/** The engine's part of a row: the plan overview, the status, the latest check-in and the alerts. */
function enginePart(db: Db, musicianId: string, now: Date): { part: CachedPart; timeZone: string | null } {
  const last = db
    .select({ date: checkIns.date })
    .from(checkIns)
    .where(eq(checkIns.musicianId, musicianId))
    .orderBy(desc(checkIns.date))
    .limit(1)
    .get();
  const lastCheckInDate = last?.date ?? null;
  const loaded = loadActivePlan(db, musicianId);
  if (!loaded) return { part: { plan: null, status: 'no_plan', lastCheckInDate, alerts: [] }, timeZone: null };
  const summary = planSummary({ ...loaded, today: now });
  const overview = toOverview(loaded.plan, summary);
  return {
    part: { plan: overview, status: overview.status, lastCheckInDate, alerts: alertsFor(loaded, summary, now) },
    timeZone: loaded.settings.timeZone,
  };
}

/** One caseload row; `fingerprint` (see caseload-cache.ts) lets an unchanged musician skip the engine. */
export function caseloadEntry(db: Db, row: MusicianRow, now: Date, fingerprint?: string): CaseloadEntry {
  const base = {
    id: row.id,
    name: row.name,
    email: row.email,
    instrument: row.instrument,
    joined: row.userId !== null,
    createdAt: row.createdAt.toISOString(),
  };
  return { ...base, ...cachedPart(db, row.id, fingerprint, now, () => enginePart(db, row.id, now)) };
}

const urgency = (entry: CaseloadEntry) =>
  entry.alerts.filter((a) => a.severity === 'urgent').length * 100 + entry.alerts.length;

const orders: Record<CaseloadQuery['sort'], (a: CaseloadEntry, b: CaseloadEntry) => number> = {
  name: () => 0,
  alerts: (a, b) => urgency(b) - urgency(a),
  event: (a, b) => (a.plan?.event.date ?? '9999').localeCompare(b.plan?.event.date ?? '9999'),
  last_check_in: (a, b) => (b.lastCheckInDate ?? '').localeCompare(a.lastCheckInDate ?? ''),
};

// A clinician's musicians and their fingerprints, kept while the database's generation stands still.
const keptRoster = keptWhileUnchanged<{ rows: MusicianRow[]; prints: Map<string, string> }>(2_000);

function rosterOf(db: Db, clinicianId: string) {
  return keptRoster(db, clinicianId, () => ({
    rows: db.select().from(musicians).where(eq(musicians.clinicianId, clinicianId)).orderBy(asc(musicians.name)).all(),
    prints: fingerprints(db, { clinicianId }),
  }));
}

/** The clinician's caseload, by name unless asked otherwise (ties stay in name order). */
export function listCaseload(db: Db, clinicianId: string, now: Date, query: CaseloadQuery = { sort: 'name' }): CaseloadEntry[] {
  const { rows, prints } = rosterOf(db, clinicianId);
  return rows
    .map((row) => caseloadEntry(db, row, now, prints.get(row.id)))
    .filter((entry) => !query.status || entry.status === query.status)
    .filter((entry) => query.alerts !== 'only' || entry.alerts.length > 0)
    .sort(orders[query.sort]);
}

export function getCaseloadEntry(db: Db, clinicianId: string, musicianId: string, now: Date): CaseloadEntry {
  const row = ownMusician(db, clinicianId, musicianId);
  return caseloadEntry(db, row, now, fingerprints(db, { musicianId }).get(musicianId));
}
