import { fireEvent, screen, within } from '@testing-library/react-native';
import type { z } from 'zod';
import { CaseloadView } from '@/components/caseload/caseload-view';
import type { CaseloadEntrySchema } from '@/shared/schemas/musician';
import { mockApi, renderScreen } from './test-utils';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));
afterEach(() => jest.restoreAllMocks());

const person = (id: string, name: string, alerts: z.input<typeof CaseloadEntrySchema>['alerts'] = []): z.input<typeof CaseloadEntrySchema> => ({
  id,
  name,
  email: `${id}@example.test`,
  instrument: 'Viola',
  joined: true,
  createdAt: '2027-03-02T09:00:00.000Z',
  plan: null,
  alerts,
});

// Invented people, sent in name order as an older server might.
const caseload = [
  person('m-1', 'Aurel Ames'),
  person('m-2', 'Bea Bright', [{ kind: 'load_warning', severity: 'warning', message: 'Recent load is high.', date: null }]),
  person('m-3', 'Cato Crane', [{ kind: 'red_flag', severity: 'urgent', message: 'Numbness reported.', date: '2027-03-10' }]),
];

describe('Caseload sorting and filtering', () => {
  it('puts urgent alerts first, then warnings, then everyone else, and asks the API for that order', async () => {
    const fetchSpy = jest.spyOn(global, 'fetch');
    mockApi({ 'GET /api/musicians': { status: 200, body: caseload }, 'GET /api/invitations': { status: 200, body: [] } });
    renderScreen(<CaseloadView />);

    await screen.findByText('Cato Crane');
    const rows = screen.getAllByTestId('caseload-entry');
    expect(within(rows[0]!).getByText('Cato Crane')).toBeTruthy();
    expect(within(rows[0]!).getByText(/Red flag/)).toBeTruthy();
    expect(within(rows[1]!).getByText('Bea Bright')).toBeTruthy();
    expect(within(rows[2]!).getByText('Aurel Ames')).toBeTruthy();
    const asked = fetchSpy.mock.calls.map(([input]) => String(input));
    expect(asked.some((url) => url.includes('/api/musicians?sort=alerts'))).toBe(true);
  });

  it('sorts by name and filters to alerts through the query parameters', async () => {
    const fetchSpy = jest.spyOn(global, 'fetch');
    mockApi({ 'GET /api/musicians': { status: 200, body: caseload }, 'GET /api/invitations': { status: 200, body: [] } });
    renderScreen(<CaseloadView />);
    await screen.findByText('Cato Crane');

    fireEvent.press(screen.getByTestId('caseload-sort-name'));
    await screen.findByText('Aurel Ames');
    const rows = screen.getAllByTestId('caseload-entry');
    expect(within(rows[0]!).getByText('Aurel Ames')).toBeTruthy();

    fireEvent.press(screen.getByTestId('caseload-show-alerts'));
    await screen.findByText('Cato Crane');
    const asked = fetchSpy.mock.calls.map(([input]) => String(input));
    expect(asked.some((url) => url.includes('sort=name&alerts=only'))).toBe(true);
  });
});
