import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { OverrideForm } from '@/components/record/override-form';
import { mockApi, renderScreen } from './test-utils';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));
afterEach(() => jest.restoreAllMocks());

describe('OverrideForm', () => {
  it('asks for a reason before recording an override, and sends nothing without one', async () => {
    const calls = mockApi({});
    renderScreen(<OverrideForm id="m-1" />);

    fireEvent.press(screen.getByTestId('override-step_back'));
    fireEvent.press(screen.getByTestId('override-submit'));

    expect(await screen.findByTestId('override-reason-error')).toHaveTextContent('Give a reason.');
    expect(calls.filter((call) => call.method === 'POST')).toHaveLength(0);
  });

  it('sends the chosen action with the reason, and shows the server refusal when it changes nothing', async () => {
    const calls = mockApi({
      'POST /api/musicians/m-1/plan/overrides': { status: 409, body: { error: { code: 'no_effect', message: 'The plan is not held, so there is nothing to resume.' } } },
    });
    renderScreen(<OverrideForm id="m-1" />);

    fireEvent.press(screen.getByTestId('override-resume'));
    fireEvent.changeText(screen.getByTestId('override-reason'), 'Reviewed in clinic; no swelling.');
    fireEvent.press(screen.getByTestId('override-submit'));

    expect(await screen.findByTestId('override-notice')).toHaveTextContent(/The plan is not held, so there is nothing to resume\./);
    await waitFor(() => expect(calls.find((call) => call.method === 'POST')?.body).toEqual({ action: 'resume', reason: 'Reviewed in clinic; no swelling.' }));
  });
});
