import { screen } from '@testing-library/react-native';
import { PlanSummary } from '@/components/musician/plan-summary';
import type { PlanOverview } from '@/shared/schemas/plan-overview';
import { renderScreen } from './test-utils';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));

const plan: PlanOverview = {
  planId: 'p-1',
  version: 1,
  today: '2026-04-10',
  status: 'held',
  stageNumber: 3,
  stageCount: 8,
  minutesPerDay: 25,
  sessionsPerDay: 2,
  longestBlockMinutes: 10,
  restMinutes: 10,
  highestTier: 'easy',
  nextStageStartDate: null,
  event: { name: 'Spring recital', date: '2026-05-20' },
  daysToEvent: 40,
  feasible: true,
  targetReachedOn: '2026-05-10',
  daysShort: 0,
  redFlagActive: false,
  lastChange: 'Holding at stage 3 after pain above the stop threshold.',
};

afterEach(() => jest.restoreAllMocks());

// The plan card of the musician's Today screen.
describe('PlanSummary', () => {
  it('says no plan yet, naming the clinician, when the plan is null', async () => {
    renderScreen(<PlanSummary plan={null} clinicianName="Dr Elin Hart" />);
    expect(await screen.findByText('No plan yet — your clinician will prepare one')).toBeTruthy();
    expect(screen.getByText(/Dr Elin Hart/)).toBeTruthy();
  });

  it('shows the stage, the allowance and the hold in words when a plan is active', async () => {
    renderScreen(<PlanSummary plan={plan} clinicianName="Dr Elin Hart" />);
    expect(await screen.findByText('Stage 3 of 8')).toBeTruthy();
    expect(screen.getByText('25 min in 2 sessions')).toBeTruthy();
    expect(screen.getByText('Holding at this stage')).toBeTruthy();
    expect(screen.queryByText('No plan yet — your clinician will prepare one')).toBeNull();
  });

  it('tells the musician not to play when a red flag is active', async () => {
    renderScreen(<PlanSummary plan={{ ...plan, redFlagActive: true }} clinicianName="Dr Elin Hart" />);
    expect(await screen.findByText('Do not play until your clinician has reviewed you')).toBeTruthy();
    expect(screen.getByText('Red flag: needs review')).toBeTruthy();
  });
});
