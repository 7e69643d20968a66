import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { TodayView } from '@/components/today/today-view';
import { mockApi, renderScreen } from './test-utils';
import { overview, resultOf, today } from './session-fixtures';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));

const home = { id: 'm-1', name: 'Oda Brenn', instrument: 'Viola', clinicianName: 'Dr Lise Amar', plan: overview };

afterEach(() => jest.restoreAllMocks());

describe('TodayView', () => {
  it('asks the next-morning question before showing the sessions, and sends it as a next-morning check', async () => {
    const calls = mockApi({
      'GET /api/today': { status: 200, body: { ...today, morningCheckFor: '2027-02-28' } },
      'GET /api/me/musician': { status: 200, body: home },
      'POST /api/check-ins': { status: 201, body: resultOf({}) },
    });
    renderScreen(<TodayView />);
    jest.useRealTimers();
    expect(await screen.findByText('About your playing on 28 Feb 2027. Answer this before today’s session.')).toBeTruthy();
    expect(screen.queryByTestId('session-start-0')).toBeNull();

    fireEvent.press(screen.getByTestId('morning-pain-0'));
    fireEvent.press(screen.getByTestId('morning-submit'));
    expect(await screen.findByTestId('session-start-0')).toBeTruthy();
    await waitFor(() => expect(calls.filter((call) => call.method === 'POST')).toHaveLength(1));
    expect(calls.find((call) => call.method === 'POST')?.body).toMatchObject({ checkIn: { kind: 'next_morning', date: '2027-03-01', pain: 0, redFlags: [] } });
  });

  it('explains a rest day instead of offering a session', async () => {
    mockApi({
      'GET /api/today': { status: 200, body: { ...today, kind: 'rest', sessions: [], notes: ['Rest day: no playing.'] } },
      'GET /api/me/musician': { status: 200, body: home },
    });
    renderScreen(<TodayView />);
    expect(await screen.findByText('Rest day: no playing today')).toBeTruthy();
    expect(screen.queryByTestId('session-start-0')).toBeNull();
    expect(screen.getByText('On schedule')).toBeTruthy();
  });

  it('says all playing is stopped while a red flag waits for review', async () => {
    mockApi({
      'GET /api/today': { status: 200, body: { ...today, kind: 'stopped', sessions: [], overview: { ...overview, status: 'stopped', redFlagActive: true, lastChange: 'Stopped on 1 Mar 2027: numbness reported.' } } },
      'GET /api/me/musician': { status: 200, body: home },
    });
    renderScreen(<TodayView />);
    expect(await screen.findByText('All playing is stopped until your clinician has reviewed you')).toBeTruthy();
    expect(screen.getByText('Red flag: needs review')).toBeTruthy();
  });
});
