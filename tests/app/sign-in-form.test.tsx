import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { SignInForm } from '@/components/auth/sign-in-form';
import { mockApi, renderScreen } from './test-utils';

afterEach(() => jest.restoreAllMocks());

describe('SignInForm', () => {
  it('shows the shared schema messages under the fields when submitted empty', async () => {
    const calls = mockApi({});
    const onSignedIn = jest.fn();
    renderScreen(<SignInForm onSignedIn={onSignedIn} />);

    fireEvent.press(screen.getByTestId('sign-in-submit'));

    expect(await screen.findByText('Enter a valid e-mail address.')).toBeTruthy();
    expect(screen.getByText('Enter your password.')).toBeTruthy();
    expect(calls.filter((call) => call.path === '/api/auth/sign-in/email')).toEqual([]);
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('posts the normalised e-mail to better-auth and reports success when the credentials are accepted', async () => {
    const calls = mockApi({ 'POST /api/auth/sign-in/email': { status: 200, body: { redirect: false, token: 't', user: { id: 'u1' } } } });
    const onSignedIn = jest.fn();
    renderScreen(<SignInForm onSignedIn={onSignedIn} />);

    fireEvent.changeText(screen.getByTestId('sign-in-email'), '  Maren.Oakley@Linden-Clinic.example ');
    fireEvent.changeText(screen.getByTestId('sign-in-password'), 'ritorno-demo-2026');
    fireEvent.press(screen.getByTestId('sign-in-submit'));

    await waitFor(() => expect(onSignedIn).toHaveBeenCalledTimes(1));
    expect(calls.find((call) => call.path === '/api/auth/sign-in/email')).toEqual({
      method: 'POST',
      path: '/api/auth/sign-in/email',
      body: { email: 'maren.oakley@linden-clinic.example', password: 'ritorno-demo-2026' },
    });
  });

  it('shows the server message above the form when the credentials are refused', async () => {
    mockApi({ 'POST /api/auth/sign-in/email': { status: 401, body: { code: 'INVALID_EMAIL_OR_PASSWORD', message: 'Invalid email or password' } } });
    const onSignedIn = jest.fn();
    renderScreen(<SignInForm onSignedIn={onSignedIn} />);

    fireEvent.changeText(screen.getByTestId('sign-in-email'), 'ilse.varga@harbourside.example');
    fireEvent.changeText(screen.getByTestId('sign-in-password'), 'wrong-password');
    fireEvent.press(screen.getByTestId('sign-in-submit'));

    expect(await screen.findByText('Invalid email or password')).toBeTruthy();
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('shows its own words when the refusal carries no message (a rate limit answered without a body)', async () => {
    jest.spyOn(global, 'fetch').mockResolvedValue(new Response('', { status: 429 }));
    const onSignedIn = jest.fn();
    renderScreen(<SignInForm onSignedIn={onSignedIn} />);

    fireEvent.changeText(screen.getByTestId('sign-in-email'), 'ilse.varga@harbourside.example');
    fireEvent.changeText(screen.getByTestId('sign-in-password'), 'ritorno-demo-2026');
    fireEvent.press(screen.getByTestId('sign-in-submit'));

    expect(await screen.findByText('That e-mail and password do not match an account.')).toBeTruthy();
    expect(onSignedIn).not.toHaveBeenCalled();
  });
});
