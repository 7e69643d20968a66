import { Slot } from 'expo-router';
import { RoleGate } from '@/components/layout/role-gate';

export default function AdminLayout() {
  return (
    <RoleGate role="admin">
      <Slot />
    </RoleGate>
  );
}
