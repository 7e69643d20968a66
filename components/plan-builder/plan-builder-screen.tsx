import { format } from 'date-fns/format';
import { addWeeks } from 'date-fns/addWeeks';
import { useMusicianQuery } from '@/hooks/use-musicians';
import { usePiecesQuery } from '@/hooks/use-pieces';
import { usePlanStateQuery, usePlanVersionQuery } from '@/hooks/use-plans';
import { PlanSettingsSchema } from '@/shared/schemas/plan-settings';
import type { Piece } from '@/shared/scheduler';
import type { PieceRecord } from '@/shared/schemas/repertoire';
import { CautionCard } from '@/components/ui/caution-card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { PlanBuilderForm } from './plan-builder-form';

const toPiece = (p: PieceRecord): Piece => ({ id: p.id, title: p.title, composer: p.composer, tier: p.tier, passages: p.passages, onProgramme: p.onProgramme });

/**
 * The plan builder. A new version starts from the active plan's settings when there is one, otherwise
 * from the engine's defaults with today as the start; an opened version starts from its own settings.
 */
export function PlanBuilderScreen({ musicianId, planId }: { musicianId: string; planId?: string }) {
  const musician = useMusicianQuery(musicianId);
  const pieces = usePiecesQuery(musicianId);
  const state = usePlanStateQuery(musicianId);
  const version = usePlanVersionQuery(musicianId, planId);

  const pending = musician.isPending || pieces.isPending || state.isPending || (planId !== undefined && version.isPending);
  const failed = musician.error ?? pieces.error ?? state.error ?? version.error;
  if (failed) return <ErrorState error={failed} testID="plan-builder-error" />;
  if (pending || !musician.data || !pieces.data) return <LoadingState label="Loading the plan builder…" />;

  const opened = version.data ?? null;
  const today = new Date();
  const initial =
    opened?.settings ??
    state.data?.plan.settings ??
    PlanSettingsSchema.parse({ startDate: format(today, 'yyyy-MM-dd'), event: { name: 'Concert', date: format(addWeeks(today, 8), 'yyyy-MM-dd') } });
  const title = opened
    ? opened.status === 'draft'
      ? `Draft version ${opened.version}`
      : `New version from version ${opened.version}`
    : 'New plan version';
  return (
    <Screen
      testID="screen-plan-builder"
      title={`${title} · ${musician.data.name}`}
      lead="Set each value or keep the default; the preview shows the stages and whether the event is in reach as you type."
      footer={<CautionCard audience="clinician" />}
    >
      <PlanBuilderForm key={opened?.id ?? 'new'} musicianId={musicianId} initial={initial} opened={opened} pieces={pieces.data.map(toPiece)} />
    </Screen>
  );
}
