import { useLocalSearchParams } from 'expo-router';
import { AuthFrame } from '@/components/auth/AuthFrame';
import { SignUpForm } from '@/components/auth/SignUpForm';
import { SwitchLink } from '@/components/auth/SwitchLink';
import { withNext } from '@/lib/next-path';

export default function SignUpScreen() {
  const { next, email } = useLocalSearchParams<{ next?: string; email?: string }>();
  return (
    <AuthFrame title="Create your account" lead="Sketch links anywhere; share them with your seminar group when you are back online.">
      <SignUpForm defaultEmail={email ?? ''} />
      <SwitchLink prompt="Already have an account?" label="Sign in" href={withNext('/sign-in', next)} />
    </AuthFrame>
  );
}
