import { useRouter } from 'expo-router';
import { useSignOutMutation } from '@/hooks/use-auth';
import { Button } from '@/components/ui/button';

/** Ends the session, forgets every cached answer and returns to sign-in. */
export function SignOutButton({ fullWidth = false }: { fullWidth?: boolean }) {
  const router = useRouter();
  const signOut = useSignOutMutation();
  return (
    <Button
      testID="nav-sign-out"
      label="Sign out"
      icon="log-out-outline"
      variant="ghost"
      fullWidth={fullWidth}
      loading={signOut.isPending}
      onPress={() => signOut.mutate(undefined, { onSettled: () => router.replace('/sign-in') })}
    />
  );
}
