import { Slot } from 'expo-router';
import { RoleGate } from '@/components/layout/role-gate';

export default function MusicianLayout() {
  return (
    <RoleGate role="musician">
      <Slot />
    </RoleGate>
  );
}
