import type { ReactTestInstance } from 'react-test-renderer';
import { screen, within } from '@testing-library/react-native';
import { StudentList } from '@/components/teacher/student-list';
import type { StudentSummary } from '@/shared/schemas/clearance';
import { mockApi, renderScreen } from './test-utils';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));

const event = { name: 'Spring Recital', date: '2027-04-20' };
const students: StudentSummary[] = [
  { id: 's-1', name: 'Oriane Falk', instrument: 'Viola', readiness: 'on_track', event, asOf: '2027-04-01' },
  { id: 's-2', name: 'Teodor Lind', instrument: 'Horn', readiness: 'delayed', event, asOf: '2027-04-01' },
  { id: 's-3', name: 'Wren Okafor', instrument: 'Flute', readiness: 'paused', event: null, asOf: '2027-04-01' },
];

afterEach(() => jest.restoreAllMocks());

describe('StudentList', () => {
  it('shows each student with readiness in words, the event date and the days to go', async () => {
    mockApi({ 'GET /api/students': { status: 200, body: students } });
    renderScreen(<StudentList />);

    const rows = await screen.findAllByTestId('student-row');
    expect(rows).toHaveLength(3);
    const [first, second, third] = rows as [ReactTestInstance, ReactTestInstance, ReactTestInstance];
    expect(within(first).getByText('On track')).toBeTruthy();
    expect(within(first).getByText('20 Apr 2027 · 19 days to go')).toBeTruthy();
    expect(within(second).getByText('Delayed')).toBeTruthy();
    expect(within(second).getByText('Horn')).toBeTruthy();
    expect(within(third).getByText('Paused')).toBeTruthy();
    expect(within(third).getByText('No event set')).toBeTruthy();
    // Readiness is told by an icon and words, never by the chip colour alone.
    expect(screen.getByTestId('readiness-delayed')).toBeTruthy();
  });

  it('links each student to their clearance', async () => {
    mockApi({ 'GET /api/students': { status: 200, body: students } });
    renderScreen(<StudentList />);

    const link = await screen.findByTestId('student-open-s-2');
    expect(link.props.accessibilityLabel).toBe('Teodor Lind, Horn, delayed. Open their playing clearance');
  });

  it('says how students appear when nobody has shared yet', async () => {
    mockApi({ 'GET /api/students': { status: 200, body: [] } });
    renderScreen(<StudentList />);

    expect(await screen.findByTestId('students-empty')).toBeTruthy();
    expect(screen.queryAllByTestId('student-row')).toHaveLength(0);
  });
});
