import { StatusBadge } from '@/components/ui/status-badge';
import type { Role } from '@/shared/schemas/role';

const look = {
  admin: { icon: 'key-outline', label: 'Administrator' },
  clinician: { icon: 'medkit-outline', label: 'Clinician' },
  musician: { icon: 'musical-notes-outline', label: 'Musician' },
  teacher: { icon: 'school-outline', label: 'Teacher' },
} as const;

export function RoleBadge({ role }: { role: Role }) {
  return <StatusBadge tone="neutral" icon={look[role].icon} label={look[role].label} />;
}
