// Sign-in, sign-up and sign-out. A signed-in visitor moves on to `?next=` (or the sketchbook),
// which is also how a finished sign-in or sign-up continues (e.g. back to an invitation).
import { Redirect, Slot, useGlobalSearchParams, useSegments } from 'expo-router';
import { useSession } from '@/hooks/useSession';
import { nextPath } from '@/lib/next-path';

export default function AuthLayout() {
  const status = useSession((s) => s.status);
  const { next } = useGlobalSearchParams<{ next?: string }>();
  const segments = useSegments();
  const signingOut = segments[segments.length - 1] === 'sign-out';
  if (status === 'signedIn' && !signingOut) return <Redirect href={nextPath(next)} />;
  return <Slot />;
}
