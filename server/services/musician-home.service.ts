import type { MusicianHome } from '../../shared/schemas/musician';
import type { Db } from '../db/client';
import { getMusicianByUser } from './musician.service';
import { planOverview } from './plan.service';

/** The signed-in musician's own summary: instrument, clinician and plan overview (null until prescribed). */
export function musicianHome(db: Db, userId: string, now: Date): MusicianHome {
  const { musician, clinicianName } = getMusicianByUser(db, userId);
  return {
    id: musician.id,
    name: musician.name,
    instrument: musician.instrument,
    clinicianName,
    plan: planOverview(db, musician.id, now),
  };
}
