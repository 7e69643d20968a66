import { AuditList } from '@/components/audit/audit-list';
import { Section } from '@/components/ui/section';
import { useMusicianAuditQuery } from '@/hooks/use-audit';

/** Who read or changed this record, and when (the audit trail of one musician). */
export function ActivityTab({ id }: { id: string }) {
  const audit = useMusicianAuditQuery(id);
  return (
    <Section title="Activity on this record" testID="record-activity">
      <AuditList query={audit} />
    </Section>
  );
}
