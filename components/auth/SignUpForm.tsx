import { StyleSheet, View } from 'react-native';
import { RegisterRequest } from '@/shared/api/auth';
import { useSignUp } from '@/hooks/queries/useAuth';
import { useApiForm } from '@/hooks/useApiForm';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { TextField } from '@/components/ui/TextField';
import { space } from '@/constants/theme';

/** Creating an account signs in at once; the (auth) layout then moves on to `next`. */
export function SignUpForm({ defaultEmail = '' }: { defaultEmail?: string }) {
  const signUp = useSignUp();
  const { control, submit, banner, busy } = useApiForm({
    schema: RegisterRequest,
    defaultValues: { displayName: '', email: defaultEmail, password: '' },
    send: signUp.mutateAsync,
    fieldsByCode: { email_taken: 'email' },
  });
  return (
    <View style={styles.form}>
      {banner ? <Banner tone="error" title="Could not create the account">{banner}</Banner> : null}
      <TextField control={control} name="displayName" label="Name" autoComplete="name"
        hint="Shown to your group beside what you share" onSubmitEditing={submit} />
      <TextField control={control} name="email" label="E-mail" autoComplete="email" inputMode="email"
        autoCapitalize="none" autoCorrect={false} onSubmitEditing={submit} />
      <TextField control={control} name="password" label="Password" secureTextEntry autoComplete="new-password"
        hint="At least 8 characters" onSubmitEditing={submit} />
      <Button label="Create account" busyLabel="Creating account…" busy={busy} onPress={submit} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
