import { useRouter } from 'expo-router';
import { useSignOutMutation } from '@/hooks/use-auth';
import { Button } from '@/components/ui/button';

/** Ends the session (or every session of the account), forgets every cached answer and returns to sign-in. */
export function SignOutButton({ fullWidth = false, everywhere = false }: { fullWidth?: boolean; everywhere?: boolean }) {
  const router = useRouter();
  const signOut = useSignOutMutation(everywhere);
  return (
    <Button
      testID={everywhere ? 'nav-sign-out-everywhere' : 'nav-sign-out'}
      label={everywhere ? 'Sign out on all devices' : 'Sign out'}
      icon={everywhere ? 'phone-portrait-outline' : 'log-out-outline'}
      variant="ghost"
      fullWidth={fullWidth}
      loading={signOut.isPending}
      onPress={() => signOut.mutate(undefined, { onSettled: () => router.replace('/sign-in') })}
    />
  );
}
