import { SharingView } from '@/components/layout/lazy-screens';

export default function SharingScreen() {
  return <SharingView />;
}
