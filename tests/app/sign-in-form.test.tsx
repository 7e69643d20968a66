import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { SignInForm } from '@/components/auth/sign-in-form';
import { authClient } from '@/lib/auth-client';
import { renderScreen } from './test-utils';

jest.mock('@/lib/auth-client', () => ({
  authClient: { signIn: { email: jest.fn() }, getSession: jest.fn() },
}));

const signInEmail = jest.mocked(authClient.signIn.email);

afterEach(() => jest.clearAllMocks());

describe('SignInForm', () => {
  it('shows the shared schema messages under the fields when submitted empty', async () => {
    const onSignedIn = jest.fn();
    renderScreen(<SignInForm onSignedIn={onSignedIn} />);

    fireEvent.press(screen.getByTestId('sign-in-submit'));

    expect(await screen.findByText('Enter a valid e-mail address.')).toBeTruthy();
    expect(screen.getByText('Enter your password.')).toBeTruthy();
    expect(signInEmail).not.toHaveBeenCalled();
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('sends the normalised e-mail and reports success when the credentials are accepted', async () => {
    signInEmail.mockResolvedValue({ data: null, error: null });
    const onSignedIn = jest.fn();
    renderScreen(<SignInForm onSignedIn={onSignedIn} />);

    fireEvent.changeText(screen.getByTestId('sign-in-email'), '  Maren.Oakley@Linden-Clinic.example ');
    fireEvent.changeText(screen.getByTestId('sign-in-password'), 'ritorno-demo-2026');
    fireEvent.press(screen.getByTestId('sign-in-submit'));

    await waitFor(() => expect(onSignedIn).toHaveBeenCalledTimes(1));
    expect(signInEmail.mock.calls[0]?.[0]).toEqual({
      email: 'maren.oakley@linden-clinic.example',
      password: 'ritorno-demo-2026',
    });
  });

  it('shows the server message above the form when the credentials are refused', async () => {
    signInEmail.mockResolvedValue({
      data: null,
      error: { status: 401, code: 'INVALID_EMAIL_OR_PASSWORD', message: 'Invalid email or password', statusText: 'Unauthorized' },
    });
    const onSignedIn = jest.fn();
    renderScreen(<SignInForm onSignedIn={onSignedIn} />);

    fireEvent.changeText(screen.getByTestId('sign-in-email'), 'ilse.varga@harbourside.example');
    fireEvent.changeText(screen.getByTestId('sign-in-password'), 'wrong-password');
    fireEvent.press(screen.getByTestId('sign-in-submit'));

    expect(await screen.findByText('Invalid email or password')).toBeTruthy();
    expect(onSignedIn).not.toHaveBeenCalled();
  });
});
