import { screen, within } from '@testing-library/react-native';
import { StudentClearanceView } from '@/components/teacher/student-clearance-view';
import type { StudentClearance } from '@/shared/schemas/clearance';
import { mockApi, renderScreen } from './test-utils';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));

const clearance: StudentClearance = {
  id: 's-1',
  name: 'Oriane Falk',
  instrument: 'Viola',
  asOf: '2027-04-01',
  readiness: 'on_track',
  event: { name: 'Spring Recital', date: '2027-04-20' },
  limits: { minutesPerDay: 40, longestBlockMinutes: 15, restMinutes: 20, sessionsPerDay: 2 },
  pieces: [
    {
      title: 'Air on a Ground',
      composer: 'Mira Tollan',
      tier: 'moderate',
      onProgramme: true,
      cleared: true,
      expectedOn: null,
      passages: [{ bars: 'bars 33-48', demands: ['speed', 'stretch'], cleared: false, expectedOn: '2027-04-09' }],
    },
    { title: 'Study in Thirds', composer: 'Len Harrow', tier: 'demanding', onProgramme: true, cleared: false, expectedOn: '2027-04-15', passages: [] },
  ],
  programme: { total: 2, cleared: 1, fullyCleared: 0 },
};

afterEach(() => jest.restoreAllMocks());

describe('StudentClearanceView', () => {
  it('separates cleared pieces from those not yet cleared, with projected dates', async () => {
    mockApi({ 'GET /api/students/s-1': { status: 200, body: clearance } });
    renderScreen(<StudentClearanceView studentId="s-1" />);

    const cleared = await screen.findByTestId('pieces-cleared');
    expect(within(cleared).getByText('Air on a Ground')).toBeTruthy();
    expect(within(cleared).getByText('Cleared now')).toBeTruthy();
    expect(within(cleared).getByText('bars 33-48 (speed and stretch)')).toBeTruthy();
    expect(within(cleared).getByText('Not yet · projected 9 Apr 2027')).toBeTruthy();
    expect(within(cleared).queryByText('Study in Thirds')).toBeNull();

    const notYet = screen.getByTestId('pieces-not-yet');
    expect(within(notYet).getByText('Study in Thirds')).toBeTruthy();
    expect(within(notYet).getByText('Not yet · projected 15 Apr 2027')).toBeTruthy();
    expect(screen.getByText(/Dates are projections/)).toBeTruthy();
  });

  it('shows the limits now and the programme readiness', async () => {
    mockApi({ 'GET /api/students/s-1': { status: 200, body: clearance } });
    renderScreen(<StudentClearanceView studentId="s-1" />);

    expect(within(await screen.findByTestId('limit-block')).getByText('15 min')).toBeTruthy();
    expect(screen.getByText('then a break of at least 20 min')).toBeTruthy();
    expect(within(screen.getByTestId('limit-day')).getByText('40 min')).toBeTruthy();
    expect(within(screen.getByTestId('limit-sessions')).getByText('2')).toBeTruthy();
    expect(screen.getByText('1 of 2 programme pieces cleared')).toBeTruthy();
    expect(screen.getByTestId('clearance-print')).toBeTruthy();
  });

  it('says plainly that there is no playing while paused, and gives no reason', async () => {
    const paused: StudentClearance = {
      ...clearance,
      readiness: 'paused',
      limits: { minutesPerDay: 0, longestBlockMinutes: 0, restMinutes: 0, sessionsPerDay: 0 },
      pieces: clearance.pieces.map((piece) => ({ ...piece, cleared: false, expectedOn: null, passages: [] })),
      programme: { total: 2, cleared: 0, fullyCleared: 0 },
    };
    mockApi({ 'GET /api/students/s-1': { status: 200, body: paused } });
    renderScreen(<StudentClearanceView studentId="s-1" />);

    expect(await screen.findByText('No playing for now')).toBeTruthy();
    expect(screen.queryByTestId('clearance-limits')).toBeNull();
    expect(screen.getAllByText('Not yet · no date for now')).toHaveLength(2);
    expect(screen.queryByText(/pain/i)).toBeNull();
  });

  it('gives no date for a projection already behind the view’s own date', async () => {
    const behind: StudentClearance = {
      ...clearance,
      pieces: [{ ...clearance.pieces[1]!, expectedOn: '2027-03-28' }],
      programme: { total: 1, cleared: 0, fullyCleared: 0 },
    };
    mockApi({ 'GET /api/students/s-1': { status: 200, body: behind } });
    renderScreen(<StudentClearanceView studentId="s-1" />);

    expect(await screen.findByText('Not yet · no date for now')).toBeTruthy();
    expect(screen.queryByText(/projected 28 Mar 2027/)).toBeNull();
  });

  it('says the clearance is no longer shared when the server answers 404', async () => {
    mockApi({});
    renderScreen(<StudentClearanceView studentId="s-9" />);

    expect(await screen.findByTestId('clearance-not-shared')).toBeTruthy();
  });
});
