import { screen } from '@testing-library/react-native';
import { ActivityTab } from '@/components/record/activity-tab';
import type { AuditEntry } from '@/shared/schemas/audit';
import { mockApi, renderScreen } from './test-utils';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));

afterEach(() => jest.restoreAllMocks());

const entry = (action: string, at: string): AuditEntry => ({
  id: `${action}-${at}`,
  at,
  actorName: 'Dr Elin Hart',
  action,
  musicianId: 'm-1',
  musicianName: 'Saskia Morrow',
  detail: {},
});

describe('ActivityTab', () => {
  it("lists who read or changed the record in words, from the musician's own trail", async () => {
    const calls = mockApi({
      'GET /api/musicians/m-1/audit': {
        status: 200,
        body: [
          entry('override.hold', '2027-03-02T10:15:00.000Z'),
          entry('record.read', '2027-03-01T09:00:00.000Z'),
          { ...entry('record.read', '2027-03-01T09:01:00.000Z'), detail: { path: '/api/musicians/m-1/notes' } },
          entry('something.new', '2027-02-28T08:00:00.000Z'),
        ],
      },
    });
    renderScreen(<ActivityTab id="m-1" />);
    expect(await screen.findByText('Held the plan')).toBeTruthy();
    expect(screen.getByText('Read the record')).toBeTruthy();
    expect(screen.getByText('Read the notes')).toBeTruthy();
    // An action without words of ours is shown as recorded rather than hidden.
    expect(screen.getByText('something.new')).toBeTruthy();
    expect(screen.getAllByTestId('audit-row')).toHaveLength(4);
    expect(calls.map((call) => `${call.method} ${call.path}`)).toContain('GET /api/musicians/m-1/audit');
  });

  it('says nothing is recorded yet when the trail is empty', async () => {
    mockApi({ 'GET /api/musicians/m-1/audit': { status: 200, body: [] } });
    renderScreen(<ActivityTab id="m-1" />);
    expect(await screen.findByTestId('audit-empty')).toBeTruthy();
  });
});
