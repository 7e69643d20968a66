import type { PieceInput } from '../../shared/schemas/piece';
import type { CreateSetupItem } from '../../shared/schemas/setup';
import type { PlanSettingsInput } from '../../shared/schemas/plan-settings';
import type { Role } from '../../shared/schemas/role';
import { addDays, isoWeekday, localDateOf, publishedLevelsPreset, toDay } from '../../shared/scheduler';
import type { DemoPainDay } from './demo-history';

/**
 * The invented demo: Harbourside Conservatory's spring showcase, the Linden Street clinic that
 * serves its students, two clinicians, four musicians and two teachers. All names are made up.
 */
export const DEMO_PASSWORD = 'ritorno-demo-2026';

interface DemoPerson {
  key: string;
  role: Role;
  name: string;
  email: string;
}

interface DemoMusician {
  person: string;
  clinician: string;
  instrument: string;
  sharedWith: string[];
  plan?: { settings: PlanSettingsInput; painDays: DemoPainDay[] };
  pieces: PieceInput[];
  setup?: CreateSetupItem[];
  notes?: string[];
  problem?: { region: string; side: 'left' | 'right' | 'both' | 'midline'; onset: string };
}

const TIME_ZONE = 'Europe/London';

/** Dates are relative to the day the demo is seeded, so the story reads the same whenever it runs. */
export function demoScenario(now: Date): { today: string; people: DemoPerson[]; musicians: DemoMusician[] } {
  const today = localDateOf(now, TIME_ZONE);
  const showcase = { name: 'Harbourside Showcase', date: addDays(today, 52) };
  // The weekly rest day falls three days after the seed day, so the demo opens on a playing day that
  // follows one (the next-morning question shows) whatever weekday it is seeded on.
  const restWeekday = ((isoWeekday(toDay(today)) + 2) % 7) + 1;
  const common = { timeZone: TIME_ZONE, event: showcase, restDaysPerWeek: 1, restWeekdays: [restWeekday] };
  const people: DemoPerson[] = [
    { key: 'admin', role: 'admin', name: 'Rita Admin', email: 'admin@ritorno.example' },
    { key: 'oakley', role: 'clinician', name: 'Dr Maren Oakley', email: 'maren.oakley@linden-clinic.example' },
    { key: 'reyne', role: 'clinician', name: 'Tomas Reyne', email: 'tomas.reyne@linden-clinic.example' },
    { key: 'varga', role: 'musician', name: 'Ilse Varga', email: 'ilse.varga@harbourside.example' },
    { key: 'brandt', role: 'musician', name: 'Caio Brandt', email: 'caio.brandt@harbourside.example' },
    { key: 'haddad', role: 'musician', name: 'Noor Haddad', email: 'noor.haddad@harbourside.example' },
    { key: 'amsel', role: 'musician', name: 'Felix Amsel', email: 'felix.amsel@harbourside.example' },
    { key: 'whitlow', role: 'teacher', name: 'Agnes Whitlow', email: 'agnes.whitlow@harbourside.example' },
    { key: 'lenz', role: 'teacher', name: 'Dario Lenz', email: 'dario.lenz@harbourside.example' },
  ];
  const musicians: DemoMusician[] = [
    {
      // On track: started on the published levels three weeks ago.
      person: 'varga',
      clinician: 'oakley',
      instrument: 'Violin',
      sharedWith: ['whitlow'],
      plan: { settings: { ...publishedLevelsPreset.values, ...common, startDate: addDays(today, -22), targetMinutesPerDay: 90 }, painDays: [] },
      pieces: [
        { title: 'Sarabande in D minor', composer: 'Elsa Brunnhofer', tier: 'easy', onProgramme: true },
        { title: 'Rondo for the Quay', composer: 'Ilario Benn', tier: 'moderate', onProgramme: true, passages: [{ bars: 'bars 88-104', demands: ['speed', 'stretch'] }] },
        { title: 'Caprice No. 3', composer: 'Ottavia Lisle', tier: 'demanding', onProgramme: true, passages: [{ bars: 'bars 1-24', demands: ['speed', 'endurance'] }] },
        { title: 'Open-string long tones', composer: '', tier: 'easy' },
      ],
    },
    {
      // Held after pain in the latest session.
      person: 'brandt',
      clinician: 'oakley',
      instrument: 'Clarinet',
      sharedWith: ['lenz'],
      problem: { region: 'Right thumb and forearm', side: 'right', onset: 'Gradual, over a term of long rehearsals' },
      notes: ['Thumb-rest moved higher; neck strap to take the weight. Review in two weeks.'],
      setup: [
        { kind: 'thumb_rest', label: 'Thumb rest raised one notch', instructions: 'Rest the thumb at the nail root, not the joint.', active: true },
        { kind: 'strap', label: 'Neck strap on every session', instructions: 'Adjust so the mouthpiece meets you without reaching.', active: true },
      ],
      plan: {
        settings: { ...common, startDate: addDays(today, -18), startMinutesPerDay: 15, targetMinutesPerDay: 75, failuresBeforeStepBack: 2 },
        painDays: [{ playingDaysAgo: 1, afterBlock: 2, pain: 3 }],
      },
      pieces: [
        { title: 'Pastorale in G', composer: 'Henrike Maas', tier: 'easy', onProgramme: true },
        { title: 'Three Harbour Dances', composer: 'Jory Calloway', tier: 'moderate', onProgramme: true, passages: [{ bars: 'bars 40-52', demands: ['range'] }] },
        { title: 'Concertino, first movement', composer: 'Ada Ferreira', tier: 'demanding', onProgramme: true, passages: [{ bars: 'bars 130-161', demands: ['speed', 'loudness'] }] },
      ],
    },
    {
      // Cannot reach the showcase programme in time: low tolerance now, a long target. Her easy piece
      // is cleared from stage 2, where she is now, so a step back takes it away again.
      person: 'haddad',
      clinician: 'oakley',
      instrument: 'Piano',
      sharedWith: ['whitlow', 'lenz'],
      plan: {
        settings: {
          ...common,
          startDate: addDays(today, -8),
          startMinutesPerDay: 5,
          startBlockMinutes: 5,
          startRestMinutes: 55,
          targetMinutesPerDay: 150,
          stepMinutes: 5,
          minDaysPerStage: 4,
          tierUnlockStage: { easy: 2, moderate: 4, demanding: 7 },
        },
        painDays: [],
      },
      pieces: [
        { title: 'Nocturne in E flat', composer: 'Wilhelmina Roos', tier: 'easy', onProgramme: true },
        { title: 'Toccata on a Bell Theme', composer: 'Piet Andersen', tier: 'demanding', onProgramme: true, passages: [{ bars: 'bars 60-95', demands: ['speed', 'stretch', 'loudness'] }] },
        { title: 'Sonatina in F', composer: 'Marguerite Oyelaran', tier: 'moderate', onProgramme: true },
      ],
    },
    {
      person: 'amsel',
      clinician: 'reyne',
      instrument: 'Cello',
      sharedWith: ['whitlow'],
      plan: { settings: { ...common, startDate: addDays(today, -10), targetMinutesPerDay: 60 }, painDays: [] },
      pieces: [
        { title: 'Elegy for Low Strings', composer: 'Sven Arkwright', tier: 'easy', onProgramme: true },
        { title: 'Suite in C, Courante', composer: 'Bettina Kohl', tier: 'moderate', onProgramme: true, passages: [{ bars: 'bars 17-30', demands: ['speed'] }] },
      ],
    },
  ];
  return { today, people, musicians };
}
