import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { SessionRunner } from '@/components/today/session-runner';
import { mockApi, renderScreen } from './test-utils';
import { resultOf, shortSession, today } from './session-fixtures';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));

const MIN = 60_000;

afterEach(() => jest.restoreAllMocks());

function answerGate(pain: number, flags: string[] = []) {
  fireEvent.press(screen.getByTestId(`gate-pain-${pain}`));
  for (const flag of flags) fireEvent.press(screen.getByTestId(`gate-flag-${flag}`));
  fireEvent.press(screen.getByTestId('gate-continue'));
}

describe('SessionRunner', () => {
  it('runs the blocks on the injected clock and ends the session at once when a gate goes over the threshold', async () => {
    const calls = mockApi({
      'POST /api/check-ins': {
        status: 201,
        body: resultOf({ stopPlaying: true, clinicianNotified: true, change: 'Held at stage 2 on 1 Mar 2027: pain 3 after block 1.' }),
      },
    });
    let clock = 0;
    renderScreen(<SessionRunner today={today} session={shortSession} now={() => clock} onClose={jest.fn()} />);
    // renderRouter turns on fake timers; the session's clock is injected, and fetch needs real ones.
    jest.useRealTimers();

    answerGate(0);
    expect(await screen.findByTestId('timer-warm_up')).toBeTruthy();
    expect(screen.getByTestId('timer-countdown')).toHaveTextContent('01:00');
    clock = 90_000;
    expect(await screen.findByTestId('timer-play')).toBeTruthy();
    expect(screen.getByTestId('timer-countdown')).toHaveTextContent('01:30');
    expect(screen.getByText('Play easy pieces: Air on the Quay.')).toBeTruthy();
    clock = 10 * MIN;
    expect(await screen.findByTestId('gate-between')).toBeTruthy();

    answerGate(3);
    expect(await screen.findByTestId('pain-stop')).toBeTruthy();
    expect(screen.queryByTestId('timer-rest')).toBeNull();
    expect(await screen.findByText('Held at stage 2 on 1 Mar 2027: pain 3 after block 1.')).toBeTruthy();
    expect(screen.getByText('Your clinician has been told.')).toBeTruthy();
    expect(screen.getByTestId('caution-card')).toBeTruthy();
    const posted = calls.filter((call) => call.method === 'POST');
    expect(posted).toHaveLength(1);
    expect(posted[0]?.body).toMatchObject({
      checkIn: {
        kind: 'session',
        date: '2027-03-01',
        sessionIndex: 0,
        gates: [{ position: 'before', pain: 0 }, { position: 'between', afterBlock: 1, pain: 3 }],
        redFlags: [],
        minutesPlayed: 2,
      },
    });
  });

  it('gives the urgent caution and says all playing is stopped on a red flag', async () => {
    const calls = mockApi({ 'POST /api/check-ins': { status: 201, body: resultOf({ stopPlaying: true, redFlag: true, clinicianNotified: true }) } });
    renderScreen(<SessionRunner today={today} session={shortSession} now={() => 0} onClose={jest.fn()} />);
    // renderRouter turns on fake timers; the session's clock is injected, and fetch needs real ones.
    jest.useRealTimers();

    answerGate(0, ['numbness']);
    expect(await screen.findByText('Stop playing and seek prompt clinical review')).toBeTruthy();
    expect(screen.getByTestId('red-flag-caution')).toHaveTextContent(/All playing is stopped until your clinician clears it/);
    await waitFor(() => expect(screen.getByTestId('send-status')).toHaveTextContent(/Saved/));
    expect(calls.find((call) => call.method === 'POST')?.body).toMatchObject({ checkIn: { redFlags: ['numbness'], gates: [{ position: 'before', pain: 0 }] } });
  });

  it('asks effort and prefilled minutes after a clean session, and saves them', async () => {
    const calls = mockApi({ 'POST /api/check-ins': { status: 201, body: resultOf({}) } });
    let clock = 0;
    renderScreen(<SessionRunner today={today} session={shortSession} now={() => clock} onClose={jest.fn()} />);
    // renderRouter turns on fake timers; the session's clock is injected, and fetch needs real ones.
    jest.useRealTimers();
    answerGate(0);
    clock = 3 * MIN;
    await screen.findByTestId('gate-between');
    answerGate(0);
    clock = 6 * MIN;
    await screen.findByTestId('gate-after');
    answerGate(0);
    clock = 7 * MIN;
    expect(await screen.findByTestId('wrap-up')).toBeTruthy();
    expect(screen.getByTestId('minutes-played')).toHaveTextContent('4 min');
    fireEvent.press(screen.getByTestId('effort-3'));
    expect(screen.getByTestId('effort-word')).toHaveTextContent('3: Moderate');
    fireEvent.press(screen.getByTestId('wrap-up-save'));
    await waitFor(() => expect(screen.getByTestId('send-status')).toHaveTextContent(/Saved/));
    expect(calls.find((call) => call.method === 'POST')?.body).toMatchObject({ checkIn: { effort: 3, minutesPlayed: 4, gates: [{}, {}, { position: 'after', afterBlock: 2, pain: 0 }] } });
  });
});
