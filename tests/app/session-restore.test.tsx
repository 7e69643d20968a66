import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { SessionScreen } from '@/components/today/session-screen';
import { memoryStore } from '@/lib/local-store';
import { mockApi, renderScreen } from './test-utils';
import { resultOf, today } from './session-fixtures';

jest.mock('@/lib/auth-client', () => ({
  authClient: { getSession: jest.fn(async () => ({ user: { id: 'mu-1' }, session: { id: 's-1' } })) },
}));
afterEach(() => jest.restoreAllMocks());

const SEC = 1_000;
const me = { id: 'mu-1', name: 'Juno Pell', email: 'juno.pell@harbourside.example', role: 'musician' };

function api() {
  return mockApi({
    'GET /api/today': { status: 200, body: today },
    'GET /api/me': { status: 200, body: me },
    'POST /api/check-ins': { status: 201, body: resultOf({}) },
  });
}

/** Renders the session screen as a fresh page load would, on the given device store and clock. */
async function open(store: ReturnType<typeof memoryStore>, now: () => number) {
  const view = renderScreen(<SessionScreen sessionIndex={0} speed={1} store={store} now={now} />);
  // renderRouter turns on fake timers; the session's clock is injected, and fetch needs real ones.
  jest.useRealTimers();
  return view;
}

describe('SessionScreen after a reload', () => {
  it('comes back at the same block, paused at the time reached, and can start over', async () => {
    api();
    const store = memoryStore();
    let clock = 0;
    const first = await open(store, () => clock);
    fireEvent.press(await screen.findByTestId('gate-pain-0'));
    fireEvent.press(screen.getByTestId('gate-continue'));
    clock = 90 * SEC;
    expect(await screen.findByTestId('timer-play')).toBeTruthy();
    await waitFor(() => expect(screen.getByTestId('timer-countdown')).toHaveTextContent('01:30'));
    first.unmount();

    // The page is loaded again much later: the block waits, paused, with 01:30 to go.
    clock = 600 * SEC;
    await open(store, () => clock);
    expect(await screen.findByTestId('session-restored')).toHaveTextContent(/Block 1 is paused with 01:30 to go/);
    expect(screen.getByTestId('timer-play')).toBeTruthy();
    expect(screen.getByTestId('timer-resume')).toBeTruthy();
    expect(screen.queryByTestId('timer-pause')).toBeNull();
    clock = 700 * SEC;
    await new Promise((resolve) => setTimeout(resolve, 600));
    expect(screen.getByTestId('timer-countdown')).toHaveTextContent('01:30');

    fireEvent.press(screen.getByTestId('session-start-over'));
    expect(await screen.findByTestId('gate-before')).toBeTruthy();
    expect(screen.queryByTestId('session-restored')).toBeNull();
  });

  it('forgets the kept place once the check-in is sent, so the session does not come back', async () => {
    const calls = api();
    const store = memoryStore();
    const clock = 0;
    const first = await open(store, () => clock);
    fireEvent.press(await screen.findByTestId('gate-pain-0'));
    fireEvent.press(screen.getByTestId('gate-flag-numbness'));
    fireEvent.press(screen.getByTestId('gate-continue'));
    expect(await screen.findByTestId('red-flag-caution')).toBeTruthy();
    await waitFor(() => expect(calls.filter((call) => call.method === 'POST')).toHaveLength(1));
    first.unmount();

    await open(store, () => clock);
    expect(await screen.findByTestId('gate-before')).toBeTruthy();
    expect(screen.queryByTestId('session-restored')).toBeNull();
  });
});
