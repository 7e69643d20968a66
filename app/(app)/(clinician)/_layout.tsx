import { Slot } from 'expo-router';
import { RoleGate } from '@/components/layout/role-gate';

export default function ClinicianLayout() {
  return (
    <RoleGate role="clinician">
      <Slot />
    </RoleGate>
  );
}
