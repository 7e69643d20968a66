import { format } from 'date-fns/format';
import { parseISO } from 'date-fns/parseISO';
import type { MyPlan } from '@/shared/schemas/my-plan';
import { Card } from '@/components/ui/card';
import { AppText } from '@/components/ui/text';
import { tierWords } from '@/components/today/step-words';

/** Where the musician stands and what the next unlock brings, with its expected date. */
export function NextUnlockCard({ plan }: { plan: MyPlan }) {
  const { overview, nextUnlock } = plan;
  const what = nextUnlock
    ? [nextUnlock.tier ? tierWords(nextUnlock.tier) : null, nextUnlock.passages ? 'demanding passages in short bursts' : null].filter(Boolean).join(' and ')
    : null;
  return (
    <Card testID="next-unlock">
      <AppText variant="heading">{`You are at stage ${overview.stageNumber} of ${overview.stageCount}`}</AppText>
      <AppText>{`${plan.cleanDays} of ${plan.minDaysPerStage} playing days without symptoms at this stage.`}</AppText>
      {nextUnlock ? (
        <>
          <AppText variant="bodyStrong">{`Next: stage ${nextUnlock.stageNumber} clears ${what}`}</AppText>
          {nextUnlock.pieces.length > 0 ? <AppText>{`Pieces: ${nextUnlock.pieces.join(', ')}`}</AppText> : null}
          <AppText tone="muted" testID="next-unlock-date">
            {nextUnlock.expectedOn
              ? `Expected from ${format(parseISO(nextUnlock.expectedOn), 'EEEE d MMMM')} if your checks stay clear.`
              : 'No date while playing is stopped: your clinician will review first.'}
          </AppText>
        </>
      ) : (
        <AppText tone="muted">Everything in your programme is cleared at this stage.</AppText>
      )}
    </Card>
  );
}
