import { Redirect, Slot, usePathname } from 'expo-router';
import { useMeQuery } from '@/hooks/use-me';

// Someone already signed in has no use for these three; invitation and reset links still open.
const signedOutOnly = ['/sign-in', '/sign-up', '/forgot-password'];

/** Sends someone signed in away from the signed-out screens; only this redraws when the answer comes. */
function AwayIfSignedIn() {
  const me = useMeQuery();
  const pathname = usePathname();
  return me.isSuccess && signedOutOnly.includes(pathname) ? <Redirect href="/" /> : null;
}

export default function AuthLayout() {
  return (
    <>
      <AwayIfSignedIn />
      <Slot />
    </>
  );
}
