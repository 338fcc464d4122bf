import { StyleSheet, View } from 'react-native';
import { LoginRequest } from '@/shared/api/auth';
import { useSignIn } from '@/hooks/queries/useAuth';
import { useApiForm } from '@/hooks/useApiForm';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { TextField } from '@/components/ui/TextField';
import { space } from '@/constants/theme';

/** Signing in stores the session; the (auth) layout then moves on to `next`. */
export function SignInForm({ defaultEmail = '' }: { defaultEmail?: string }) {
  const signIn = useSignIn();
  const { control, submit, banner, busy } = useApiForm({
    schema: LoginRequest,
    defaultValues: { email: defaultEmail, password: '' },
    send: signIn.mutateAsync,
  });
  return (
    <View style={styles.form}>
      {banner ? <Banner tone="error" title="Could not sign in">{banner}</Banner> : null}
      <TextField control={control} name="email" label="E-mail" autoComplete="email" inputMode="email"
        autoCapitalize="none" autoCorrect={false} onSubmitEditing={submit} />
      <TextField control={control} name="password" label="Password" secureTextEntry autoComplete="current-password"
        onSubmitEditing={submit} />
      <Button label="Sign in" busyLabel="Signing in…" busy={busy} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
