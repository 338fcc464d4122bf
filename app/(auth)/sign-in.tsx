import { useLocalSearchParams } from 'expo-router';
import { AuthFrame } from '@/components/auth/AuthFrame';
import { SignInForm } from '@/components/auth/SignInForm';
import { SwitchLink } from '@/components/auth/SwitchLink';
import { withNext } from '@/lib/next-path';

export default function SignInScreen() {
  const { next, email } = useLocalSearchParams<{ next?: string; email?: string }>();
  return (
    <AuthFrame title="Sign in" lead="Your sketchbook works offline; signing in lets it sync with your group.">
      <SignInForm defaultEmail={email ?? ''} />
      <SwitchLink prompt="New to Overstrand?" label="Create an account" href={withNext('/sign-up', next)} />
    </AuthFrame>
  );
}
