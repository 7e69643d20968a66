import { MusicianHomeView } from '@/components/musician/musician-home-view';

export default function MusicianHomeScreen() {
  return <MusicianHomeView />;
}
