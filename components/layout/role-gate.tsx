import type { ReactNode } from 'react';
import { Redirect } from 'expo-router';
import { useMeQuery } from '@/hooks/use-me';
import type { Role } from '@/shared/schemas/role';

export interface RoleGateProps {
  role: Role;
  children: ReactNode;
}

/** Sends someone to their own start page when they open another role's screen. Convenience only: the server decides. */
export function RoleGate({ role, children }: RoleGateProps) {
  const me = useMeQuery();
  if (!me.data) return null;
  if (me.data.role !== role) return <Redirect href="/" />;
  return children;
}
