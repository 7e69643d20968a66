import type { ComponentProps } from 'react';
import type { IconName } from '@/components/ui/icon';
import type { Role } from '@/shared/schemas/role';
import { isMailboxOff, useDevMailQuery } from './use-dev-mail';

export interface NavItem {
  href: '/caseload' | '/home' | '/plan' | '/history' | '/students' | '/users' | '/audit' | '/mailbox' | '/sharing';
  label: string;
  icon: IconName;
  testID: string;
}

const byRole: Record<Role, NavItem[]> = {
  clinician: [{ href: '/caseload', label: 'Caseload', icon: 'people-outline', testID: 'nav-caseload' }],
  musician: [
    { href: '/home', label: 'Today', icon: 'musical-notes-outline', testID: 'nav-home' },
    { href: '/plan', label: 'My plan', icon: 'trail-sign-outline', testID: 'nav-plan' },
    { href: '/history', label: 'History', icon: 'stats-chart-outline', testID: 'nav-history' },
    { href: '/sharing', label: 'Sharing', icon: 'share-social-outline', testID: 'nav-sharing' },
  ],
  teacher: [{ href: '/students', label: 'Students', icon: 'school-outline', testID: 'nav-students' }],
  admin: [
    { href: '/users', label: 'Accounts', icon: 'person-circle-outline', testID: 'nav-users' },
    { href: '/audit', label: 'Audit trail', icon: 'document-text-outline', testID: 'nav-audit' },
    { href: '/mailbox', label: 'Mailbox', icon: 'mail-outline', testID: 'nav-mail' },
  ],
};

/** Where each role lands after signing in. */
export function homeHrefFor(role: Role): NavItem['href'] {
  return byRole[role][0]?.href ?? '/home';
}

/** The navigation of a role; the admin's mailbox disappears when a real SMTP server is configured. */
export function useNavItems(role: Role): NavItem[] {
  const mail = useDevMailQuery({ enabled: role === 'admin' });
  const items = byRole[role];
  if (role === 'admin' && isMailboxOff(mail.error)) return items.filter((item) => item.href !== '/mailbox');
  return items;
}
