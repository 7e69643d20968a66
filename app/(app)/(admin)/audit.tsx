import { AuditList } from '@/components/audit/audit-list';
import { Screen } from '@/components/ui/screen';
import { useFullAuditQuery } from '@/hooks/use-audit';

export default function AuditScreen() {
  const audit = useFullAuditQuery();
  return (
    <Screen testID="screen-audit" title="Audit trail" lead="Who read or changed a musician's record, and when. The newest 500 entries.">
      <AuditList query={audit} />
    </Screen>
  );
}
