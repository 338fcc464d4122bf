import { StyleSheet, View } from 'react-native';
import { CreateGroupRequest, type GroupSummary } from '@/shared/api/groups';
import { useCreateGroup } from '@/hooks/queries/useGroups';
import { useApiForm } from '@/hooks/useApiForm';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { TextField } from '@/components/ui/TextField';
import { space } from '@/constants/theme';

export function CreateGroupForm({ onCreated }: { onCreated: (group: GroupSummary) => void }) {
  const create = useCreateGroup();
  const { form, control, submit, banner, busy } = useApiForm({
    schema: CreateGroupRequest,
    defaultValues: { name: '' },
    send: async (values) => {
      const group = await create.mutateAsync(values);
      form.reset();
      onCreated(group);
    },
  });
  return (
    <View style={styles.form}>
      {banner ? <Banner tone="error">{banner}</Banner> : null}
      <TextField control={control} name="name" label="New group" placeholder="e.g. Knot theory seminar"
        onSubmitEditing={submit} />
      <View style={styles.actions}>
        <Button label="Create group" busyLabel="Creating…" busy={busy} onPress={submit} variant="secondary" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.md }, actions: { flexDirection: 'row' } });
