import { useEffect } from 'react';
import { useRouter } from 'expo-router';
import { AuthFrame } from '@/components/auth/AuthFrame';
import { Button } from '@/components/ui/Button';
import { useSession } from '@/hooks/useSession';

/** Forgets the session on this device (token and cached group data), then offers to sign in again. */
export default function SignOutScreen() {
  const router = useRouter();
  const status = useSession((s) => s.status);
  const signOut = useSession((s) => s.signOut);
  useEffect(() => {
    if (status === 'signedIn') void signOut();
  }, [status, signOut]);

  const done = status === 'signedOut';
  return (
    <AuthFrame title={done ? 'You are signed out' : 'Signing out…'}
      lead="The session is removed from this device. Sign in again to sync with your group.">
      <Button label="Sign in again" disabled={!done} onPress={() => router.replace('/sign-in')} />
    </AuthFrame>
  );
}
