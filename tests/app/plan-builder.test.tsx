import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { PlanBuilderForm } from '@/components/plan-builder/plan-builder-form';
import { PlanSettingsSchema } from '@/shared/schemas/plan-settings';
import type { Piece } from '@/shared/scheduler';
import { mockApi, renderScreen } from './test-utils';

jest.mock('@/lib/auth-client', () => ({ authClient: { getSession: jest.fn() } }));
afterEach(() => jest.restoreAllMocks());

// Invented demo values: 10 minutes tolerated now, 60 at the event, defaults for the rest.
const initial = PlanSettingsSchema.parse({
  startDate: '2027-03-01',
  timeZone: 'Europe/London',
  event: { name: 'Spring recital', date: '2027-06-30' },
  startMinutesPerDay: 10,
  targetMinutesPerDay: 60,
});

const pieces: Piece[] = [
  { id: 'p-1', title: 'Lullaby in A', composer: 'Invented Composer', tier: 'easy', passages: [], onProgramme: true },
  { id: 'p-2', title: 'Storm Etude', composer: 'Invented Composer', tier: 'demanding', passages: [{ bars: 'bars 1-20', demands: ['speed'] }], onProgramme: true },
];

function renderBuilder() {
  return renderScreen(<PlanBuilderForm musicianId="m-1" initial={initial} opened={null} pieces={pieces} />);
}

describe('PlanBuilderForm', () => {
  it('shows the server 422 issues beside the fields they name when saving', async () => {
    const calls = mockApi({
      'POST /api/musicians/m-1/plans': {
        status: 422,
        body: {
          error: {
            code: 'validation_failed',
            message: 'Some fields need attention.',
            issues: [
              { path: 'settings.event.name', message: 'Name the event' },
              { path: 'settings.targetMinutesPerDay', message: 'The target needs more sessions or longer sessions per day' },
            ],
          },
        },
      },
    });
    renderBuilder();
    fireEvent.press(screen.getByTestId('plan-save'));

    expect(await screen.findByTestId('plan-event-name-error')).toHaveTextContent('Name the event');
    expect(screen.getByTestId('plan-targetMinutesPerDay-error')).toHaveTextContent('The target needs more sessions or longer sessions per day');
    expect(calls).toHaveLength(1);
    expect(calls[0]?.body).toMatchObject({ settings: { event: { name: 'Spring recital' }, targetMinutesPerDay: 60 } });
  });

  it('flips the live preview to out of reach when the event comes too close, and offers the options', async () => {
    mockApi({});
    renderBuilder();
    expect(await screen.findByTestId('preview-feasible')).toBeTruthy();

    fireEvent.changeText(screen.getByTestId('plan-event-date'), '2027-03-20');

    expect(await screen.findByTestId('preview-infeasible')).toBeTruthy();
    expect(screen.queryByTestId('preview-feasible')).toBeNull();
    expect(screen.getByTestId('reduced-not-ready')).toHaveTextContent(/Storm Etude/);
    expect(screen.getByTestId('option-shorter-target')).toBeTruthy();

    fireEvent.press(screen.getByTestId('option-later-date'));
    expect(await screen.findByTestId('preview-feasible')).toBeTruthy();
    expect(screen.getByTestId('plan-event-date').props.value).not.toBe('2027-03-20');
  });

  it('marks a field the engine refuses and waits for it before previewing', async () => {
    mockApi({});
    renderBuilder();
    fireEvent.changeText(screen.getByTestId('plan-targetMinutesPerDay'), '5');

    expect(await screen.findByTestId('plan-targetMinutesPerDay-error')).toHaveTextContent('The target cannot be below the minutes tolerated now');
    await waitFor(() => expect(screen.getByTestId('preview-waiting')).toBeTruthy());
  });
});
