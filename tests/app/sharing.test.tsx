import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { SharingView } from '@/components/sharing/sharing-view';
import type { Share } from '@/shared/schemas/share';
import { mockApi, renderScreen } from './test-utils';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));

const shares: Share[] = [
  { teacherId: 't-1', name: 'Hanne Mork', email: 'hanne.mork@example.test', status: 'active', since: '2027-03-02T09:00:00.000Z' },
  { teacherId: null, name: 'Ivo Stary', email: 'ivo.stary@example.test', status: 'invited', since: '2027-03-05T09:00:00.000Z' },
];

afterEach(() => jest.restoreAllMocks());

function fill(name: string, email: string) {
  fireEvent.changeText(screen.getByTestId('share-name'), name);
  fireEvent.changeText(screen.getByTestId('share-email'), email);
}

describe('SharingView', () => {
  it('lists who sees the clearance and who is still invited', async () => {
    mockApi({ 'GET /api/shares': { status: 200, body: shares } });
    renderScreen(<SharingView />);

    expect(await screen.findByText('Hanne Mork')).toBeTruthy();
    expect(screen.getByTestId('share-status-active')).toBeTruthy();
    expect(screen.getByTestId('share-status-invited')).toBeTruthy();
    expect(screen.getByText(/never your pain scores, check-ins, notes or documents/)).toBeTruthy();
  });

  it('checks the fields before sending anything', async () => {
    const calls = mockApi({ 'GET /api/shares': { status: 200, body: [] } });
    renderScreen(<SharingView />);
    await screen.findByTestId('share-list-empty');

    fill('', 'not-an-address');
    fireEvent.press(screen.getByTestId('share-submit'));

    expect(await screen.findByText('Enter a name.')).toBeTruthy();
    expect(screen.getByText('Enter a valid e-mail address.')).toBeTruthy();
    expect(calls.filter((call) => call.method === 'POST')).toHaveLength(0);
  });

  it('puts the server’s refusal of a non-teacher address on the e-mail field', async () => {
    const message = 'That address belongs to an account that is not a teacher’s.';
    mockApi({
      'GET /api/shares': { status: 200, body: [] },
      'POST /api/shares': { status: 409, body: { error: { code: 'not_a_teacher', message } } },
    });
    renderScreen(<SharingView />);
    await screen.findByTestId('share-list-empty');

    fill('Pia Lund', 'pia.lund@example.test');
    fireEvent.press(screen.getByTestId('share-submit'));

    expect(await screen.findByTestId('share-email-error')).toHaveTextContent(message);
  });

  it('maps 422 field issues back onto the fields', async () => {
    mockApi({
      'GET /api/shares': { status: 200, body: [] },
      'POST /api/shares': {
        status: 422,
        body: { error: { code: 'invalid_input', message: 'Check the form.', issues: [{ path: 'name', message: 'That name is too long.' }] } },
      },
    });
    renderScreen(<SharingView />);
    await screen.findByTestId('share-list-empty');

    fill('Pia Lund', 'pia.lund@example.test');
    fireEvent.press(screen.getByTestId('share-submit'));

    expect(await screen.findByTestId('share-name-error')).toHaveTextContent('That name is too long.');
  });

  it('stops sharing only after the confirmation, with a DELETE of that teacher', async () => {
    const calls = mockApi({
      'GET /api/shares': { status: 200, body: shares },
      'DELETE /api/shares/teachers/t-1': { status: 204, body: undefined },
    });
    renderScreen(<SharingView />);

    fireEvent.press(await screen.findByTestId('share-stop'));
    expect(calls.filter((call) => call.method === 'DELETE')).toHaveLength(0);
    expect(screen.getByText('Stop sharing with Hanne Mork?')).toBeTruthy();

    fireEvent.press(screen.getByTestId('share-stop-confirm'));
    await waitFor(() =>
      expect(calls.filter((call) => call.method === 'DELETE').map((call) => call.path)).toEqual(['/api/shares/teachers/t-1']),
    );
    await waitFor(() => expect(calls.filter((call) => call.path === '/api/shares' && call.method === 'GET')).toHaveLength(2));
  });

  it('withdraws an open invitation by its address', async () => {
    const calls = mockApi({
      'GET /api/shares': { status: 200, body: shares },
      'DELETE /api/shares/invitations/ivo.stary%40example.test': { status: 204, body: undefined },
    });
    renderScreen(<SharingView />);

    fireEvent.press(await screen.findByTestId('share-withdraw'));
    await waitFor(() =>
      expect(calls.filter((call) => call.method === 'DELETE').map((call) => call.path)).toEqual([
        '/api/shares/invitations/ivo.stary%40example.test',
      ]),
    );
  });
});
