import { Redirect, Slot, usePathname } from 'expo-router';
import { useQueryClient } from '@tanstack/react-query';
import { meKeys } from '@/hooks/use-me';

// Someone already signed in has no use for these three; invitation and reset links still open.
const signedOutOnly = ['/sign-in', '/sign-up', '/forgot-password'];

/**
 * Sends someone the app already knows to be signed in away from the signed-out screens (a navigation
 * inside the app). A page opened from the address bar is sent home by the server before it is drawn
 * (server/middleware/web-export.ts), so this only reads what the app holds and asks the server nothing.
 */
function AwayIfSignedIn() {
  const known = useQueryClient().getQueryData(meKeys.current());
  const pathname = usePathname();
  return known && signedOutOnly.includes(pathname) ? <Redirect href="/" /> : null;
}

export default function AuthLayout() {
  return (
    <>
      <AwayIfSignedIn />
      <Slot />
    </>
  );
}
