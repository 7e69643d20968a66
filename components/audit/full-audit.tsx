import { useFullAuditQuery } from '@/hooks/use-audit';
import { AuditList } from './audit-list';

/** The administrator's audit trail: every musician's record, newest first. */
export function FullAudit() {
  const audit = useFullAuditQuery();
  return <AuditList query={audit} />;
}
