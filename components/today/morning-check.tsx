import { spokenDate } from '@/shared/scheduler';
import { Card } from '@/components/ui/card';
import { AppText } from '@/components/ui/text';
import { PainCheckForm } from './pain-check-form';
import type { RedFlag } from '@/shared/schemas/check-in';

export interface MorningCheckProps {
  /** The playing day the question is about. */
  about: string;
  onSubmit: (pain: number, redFlags: RedFlag[]) => void;
}

/**
 * The next-morning question, asked before today's sessions: symptoms may come later or the next day
 * (BAPAM return-to-play guidance), so the answer counts for progression.
 */
export function MorningCheck({ about, onSubmit }: MorningCheckProps) {
  return (
    <Card testID="morning-check">
      <AppText variant="heading">Good morning: how does it feel?</AppText>
      <AppText tone="muted">{`About your playing on ${spokenDate(about)}. Answer this before today’s session.`}</AppText>
      <PainCheckForm testIDPrefix="morning" submitLabel="Save morning check" painLabel="Pain this morning, 0 to 10" onSubmit={onSubmit} />
    </Card>
  );
}
