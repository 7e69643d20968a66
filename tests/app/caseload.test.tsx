import { screen } from '@testing-library/react-native';
import { CaseloadView } from '@/components/caseload/caseload-view';
import type { z } from 'zod';
import type { CaseloadEntrySchema } from '@/shared/schemas/musician';
import type { Invitation } from '@/shared/schemas/invitation';
import { mockApi, renderScreen } from './test-utils';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));

// What the server sends (fields with defaults may be left out).
const caseload: z.input<typeof CaseloadEntrySchema>[] = [
  {
    id: 'm-1',
    name: 'Oriane Falk',
    email: 'oriane.falk@example.test',
    instrument: 'Viola',
    joined: true,
    createdAt: '2026-03-02T09:00:00.000Z',
    plan: null,
  },
  {
    id: 'm-2',
    name: 'Teodor Lind',
    email: 'teodor.lind@example.test',
    instrument: 'Horn',
    joined: false,
    createdAt: '2026-03-04T09:00:00.000Z',
    plan: null,
  },
];

const invitations: Invitation[] = [
  {
    id: 'i-1',
    role: 'musician',
    name: 'Teodor Lind',
    email: 'teodor.lind@example.test',
    status: 'pending',
    expiresAt: '2026-03-11T09:00:00.000Z',
    createdAt: '2026-03-04T09:00:00.000Z',
  },
];

afterEach(() => jest.restoreAllMocks());

describe('CaseloadView', () => {
  it('lists the musicians the API returns, with who has joined and who is still invited', async () => {
    mockApi({
      'GET /api/musicians': { status: 200, body: caseload },
      'GET /api/invitations': { status: 200, body: invitations },
    });
    renderScreen(<CaseloadView />);

    expect(await screen.findByText('Oriane Falk')).toBeTruthy();
    expect(screen.getByText('Viola')).toBeTruthy();
    expect(screen.getAllByTestId('caseload-entry')).toHaveLength(2);
    expect(screen.getByText('Joined')).toBeTruthy();
    expect(screen.getByText('Invitation sent')).toBeTruthy();
    expect(await screen.findByTestId('invitation-status-pending')).toBeTruthy();
    expect(screen.getAllByText('No plan yet')).toHaveLength(2);
  });

  it('says how to start when the caseload is empty', async () => {
    mockApi({
      'GET /api/musicians': { status: 200, body: [] },
      'GET /api/invitations': { status: 200, body: [] },
    });
    renderScreen(<CaseloadView />);

    expect(await screen.findByTestId('caseload-empty')).toBeTruthy();
    expect(screen.queryAllByTestId('caseload-entry')).toHaveLength(0);
  });

  it('shows the server message when the caseload cannot be loaded', async () => {
    mockApi({
      'GET /api/musicians': { status: 403, body: { error: { code: 'forbidden', message: 'Your role cannot do this.' } } },
      'GET /api/invitations': { status: 200, body: [] },
    });
    renderScreen(<CaseloadView />);

    expect(await screen.findByText('Your role cannot do this.')).toBeTruthy();
  });
});
