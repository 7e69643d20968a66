import { FullAudit } from '@/components/layout/lazy-screens';
import { Screen } from '@/components/ui/screen';

export default function AuditScreen() {
  return (
    <Screen testID="screen-audit" title="Audit trail" lead="Who read or changed a musician's record, and when. The newest 500 entries.">
      <FullAudit />
    </Screen>
  );
}
