import { Redirect, Slot, usePathname } from 'expo-router';
import { useMeQuery } from '@/hooks/use-me';

// Someone already signed in has no use for these three; invitation and reset links still open.
const signedOutOnly = ['/sign-in', '/sign-up', '/forgot-password'];

export default function AuthLayout() {
  const me = useMeQuery();
  const pathname = usePathname();
  if (me.isSuccess && signedOutOnly.includes(pathname)) return <Redirect href="/" />;
  return <Slot />;
}
