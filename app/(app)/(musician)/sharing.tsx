import { SharingView } from '@/components/sharing/sharing-view';

export default function SharingScreen() {
  return <SharingView />;
}
