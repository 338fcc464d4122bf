import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Controller } from 'react-hook-form';
import { CreateInvitationRequest, type Role } from '@/shared/api/groups';
import { useInvite } from '@/hooks/queries/useInvitations';
import { useApiForm } from '@/hooks/useApiForm';
import { assignableRoles } from '@/shared/api/roles';
import { roleDescriptions } from '@/lib/role-descriptions';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { RolePicker } from '@/components/ui/RolePicker';
import { TextField } from '@/components/ui/TextField';
import { colors, space, type } from '@/constants/theme';

/** Invite by e-mail with a role; only rendered for owners and admins. */
export function InviteForm({ groupId, myRole }: { groupId: string; myRole: Role }) {
  const invite = useInvite(groupId);
  const [sent, setSent] = useState<string | null>(null);
  const { form, control, submit, banner, busy } = useApiForm({
    schema: CreateInvitationRequest,
    defaultValues: { email: '', role: 'member' },
    send: async (values) => {
      setSent(null);
      const invitation = await invite.mutateAsync(values);
      form.reset({ email: '', role: values.role });
      setSent(`Invitation sent to ${invitation.email} as ${invitation.role}.`);
    },
  });
  const role = form.watch('role');

  return (
    <View style={styles.form} testID="invite-form">
      {banner ? <Banner tone="error">{banner}</Banner> : null}
      {sent && !banner ? <Banner tone="success">{sent}</Banner> : null}
      <TextField control={control} name="email" label="E-mail" placeholder="colleague@university.edu"
        inputMode="email" autoCapitalize="none" autoCorrect={false} onSubmitEditing={submit} />
      <View style={styles.roleBlock}>
        <Text style={styles.label}>Role</Text>
        <Controller
          control={control}
          name="role"
          render={({ field }) => (
            <RolePicker label="Role" value={field.value} options={assignableRoles(myRole)} onChange={field.onChange} />
          )}
        />
        {role ? <Text style={styles.hint}>{roleDescriptions[role as Role]}</Text> : null}
      </View>
      <View style={styles.actions}>
        <Button label="Send invitation" busyLabel="Sending…" busy={busy} onPress={submit} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  roleBlock: { gap: space.xs + 2 },
  label: { ...type.label, color: colors.ink },
  hint: { ...type.small, color: colors.inkMuted },
  actions: { flexDirection: 'row' },
});
