import { Slot } from 'expo-router';
import { RoleGate } from '@/components/layout/role-gate';

export default function TeacherLayout() {
  return (
    <RoleGate role="teacher">
      <Slot />
    </RoleGate>
  );
}
