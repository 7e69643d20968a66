import { Redirect } from 'expo-router';
import { useMeQuery } from '@/hooks/use-me';
import { homeHrefFor } from '@/hooks/use-nav-items';

export default function StartRedirect() {
  const me = useMeQuery();
  if (!me.data) return null;
  return <Redirect href={homeHrefFor(me.data.role)} />;
}
