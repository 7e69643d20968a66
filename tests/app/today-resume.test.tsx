import { screen } from '@testing-library/react-native';
import { sessionReducer, startSession } from '@/components/today/session-machine';
import { saveProgress, snapshotOf } from '@/components/today/session-progress';
import { TodayView } from '@/components/today/today-view';
import { memoryStore } from '@/lib/local-store';
import { mockApi, renderScreen } from './test-utils';
import { overview, shortSession, today } from './session-fixtures';

jest.mock('@/lib/auth-client', () => ({
  authClient: { getSession: jest.fn(async () => ({ user: { id: 'mu-1' }, session: { id: 's-1' } })) },
}));
afterEach(() => jest.restoreAllMocks());

const me = { id: 'mu-1', name: 'Juno Pell', email: 'juno.pell@harbourside.example', role: 'musician' };
const home = { id: 'm-1', name: 'Juno Pell', instrument: 'Viola', clinicianName: 'Dr Lise Amar', plan: overview };

function api() {
  mockApi({
    'GET /api/today': { status: 200, body: today },
    'GET /api/me': { status: 200, body: me },
    'GET /api/me/musician': { status: 200, body: home },
  });
}

describe('TodayView with a session left part-way', () => {
  it('offers to continue the session whose place is kept on this device, and to start it otherwise', async () => {
    api();
    const store = memoryStore();
    const started = sessionReducer(startSession(shortSession, { threshold: 0 }), { type: 'answer_gate', pain: 0, redFlags: [], at: 0 });
    saveProgress(store, snapshotOf({ musicianId: 'mu-1', date: today.date, sessionIndex: 0 }, shortSession, started, 1_000)!);
    renderScreen(<TodayView store={store} />);
    jest.useRealTimers();
    expect(await screen.findByText('Continue session 1')).toBeTruthy();
  });

  it('offers to start when nothing is kept', async () => {
    api();
    renderScreen(<TodayView store={memoryStore()} />);
    jest.useRealTimers();
    expect(await screen.findByText('Start session 1')).toBeTruthy();
    expect(screen.queryByText('Continue session 1')).toBeNull();
  });
});
