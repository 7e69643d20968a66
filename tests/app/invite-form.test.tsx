import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { InviteForm } from '@/components/caseload/invite-form';
import { mockApi, renderScreen } from './test-utils';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));

afterEach(() => jest.restoreAllMocks());

function fill(name: string, email: string) {
  fireEvent.changeText(screen.getByTestId('invite-name'), name);
  fireEvent.changeText(screen.getByTestId('invite-email'), email);
}

describe('InviteForm', () => {
  it('asks for the instrument of a musician before sending anything', async () => {
    const calls = mockApi({});
    renderScreen(<InviteForm />);

    fill('Pia Lund', 'pia.lund@example.test');
    fireEvent.press(screen.getByTestId('invite-submit'));

    expect(await screen.findByText('Enter the instrument.')).toBeTruthy();
    expect(calls.filter((call) => call.method === 'POST')).toHaveLength(0);
  });

  it('sends a teacher invitation without an instrument', async () => {
    const calls = mockApi({
      'POST /api/invitations': {
        status: 201,
        body: {
          id: 'i-9',
          role: 'teacher',
          name: 'Pia Lund',
          email: 'pia.lund@example.test',
          status: 'pending',
          expiresAt: '2026-03-11T09:00:00.000Z',
          createdAt: '2026-03-04T09:00:00.000Z',
          musicianId: null,
          emailSent: true,
        },
      },
    });
    renderScreen(<InviteForm />);

    fireEvent.press(screen.getByTestId('invite-role-teacher'));
    expect(screen.queryByTestId('invite-instrument')).toBeNull();
    fill('Pia Lund', 'Pia.Lund@example.test');
    fireEvent.press(screen.getByTestId('invite-submit'));

    expect(await screen.findByText(/Invitation sent to Pia Lund/)).toBeTruthy();
    const post = calls.find((call) => call.method === 'POST');
    expect(post?.body).toEqual({ role: 'teacher', name: 'Pia Lund', email: 'pia.lund@example.test' });
  });

  it('puts the server’s field messages back on the fields', async () => {
    mockApi({
      'POST /api/invitations': {
        status: 422,
        body: {
          error: {
            code: 'invalid_input',
            message: 'Some fields need attention.',
            issues: [{ path: 'instrument', message: 'Keep the instrument under 60 characters.' }],
          },
        },
      },
    });
    renderScreen(<InviteForm />);

    fill('Pia Lund', 'pia.lund@example.test');
    fireEvent.changeText(screen.getByTestId('invite-instrument'), 'Oboe');
    fireEvent.press(screen.getByTestId('invite-submit'));

    await waitFor(() =>
      expect(screen.getByTestId('invite-instrument-error')).toHaveTextContent('Keep the instrument under 60 characters.'),
    );
  });

  it('marks the e-mail field when someone already has an account with it', async () => {
    mockApi({
      'POST /api/invitations': {
        status: 409,
        body: { error: { code: 'email_taken', message: 'Someone already has an account with this e-mail address.' } },
      },
    });
    renderScreen(<InviteForm />);

    fill('Pia Lund', 'pia.lund@example.test');
    fireEvent.changeText(screen.getByTestId('invite-instrument'), 'Oboe');
    fireEvent.press(screen.getByTestId('invite-submit'));

    await waitFor(() =>
      expect(screen.getByTestId('invite-email-error')).toHaveTextContent('Someone already has an account with this e-mail address.'),
    );
  });
});
