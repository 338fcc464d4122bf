// Who I am, my groups (open one, create one), sign out. The Account tab's list pane.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useRouter, useGlobalSearchParams } from 'expo-router';
import { useSession } from '@/hooks/useSession';
import { useMe } from '@/hooks/queries/useMe';
import { useGroups } from '@/hooks/queries/useGroups';
import { useNotifications } from '@/hooks/queries/useNotifications';
import { isApiError } from '@/lib/api';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Section } from '@/components/ui/Section';
import { Button } from '@/components/ui/Button';
import { Banner } from '@/components/ui/Banner';
import { RoleBadge } from '@/components/ui/RoleBadge';
import { CreateGroupForm } from '@/components/groups/CreateGroupForm';
import { colors, radius, space, type } from '@/constants/theme';
import type { PressState } from '@/components/ui/press-state';

export function AccountOverview() {
  const router = useRouter();
  // The stored user shows at once; /api/me refreshes it (and signs out if the token is dead).
  const stored = useSession((s) => s.user);
  const user = useMe().data ?? stored;
  const groups = useGroups();
  const { id: openId } = useGlobalSearchParams<{ id?: string }>();
  const open = (id: string) => router.push(`/account/groups/${id}`);
  const unread = useNotifications().data?.unread ?? 0;

  return (
    <Screen>
      <PageTitle title="Account" />
      <Section title="Signed in as">
        <View style={styles.me}>
          <View style={styles.avatar}>
            <Text style={styles.avatarText}>{initials(user?.displayName ?? '')}</Text>
          </View>
          <View style={styles.meText}>
            <Text style={styles.name}>{user?.displayName}</Text>
            <Text style={styles.email}>{user?.email}</Text>
          </View>
        </View>
        <View style={styles.row}>
          <Button variant="secondary" label="Sign out" onPress={() => router.push('/sign-out')} />
        </View>
      </Section>

      <Section title="Notifications">
        <Pressable role="link" aria-label="Open notifications" onPress={() => router.push('/account/notifications')}
          style={({ hovered }: PressState) => [styles.group, hovered && styles.groupOn]}>
          <Text style={styles.groupName}>Notifications</Text>
          {unread ? <Text style={styles.unread}>{unread} new</Text> : null}
          <Text style={styles.chevron}>›</Text>
        </Pressable>
      </Section>

      <Section title="Groups" note="Your research group shares sketches, runs and discussion on its feed.">
        {groups.isPending ? <Text style={styles.muted}>Loading groups…</Text> : null}
        {groups.isError ? (
          <Banner tone="error">{isApiError(groups.error) ? groups.error.message : 'Could not load your groups.'}</Banner>
        ) : null}
        {groups.data?.length === 0 ? (
          <Text style={styles.muted}>
            You are not in a group yet. Create one for your seminar below, or open the invitation link someone sent you.
          </Text>
        ) : null}
        {groups.data && groups.data.length > 0 ? (
          <View role="list" style={styles.list}>
            {groups.data.map((g) => (
              <Pressable key={g.id} role="link" aria-label={`Open ${g.name}`} onPress={() => open(g.id)}
                style={({ hovered }: PressState) => [styles.group, (hovered || g.id === openId) && styles.groupOn]}>
                <Text style={styles.groupName} numberOfLines={1}>{g.name}</Text>
                <RoleBadge role={g.role} />
                <Text style={styles.chevron}>›</Text>
              </Pressable>
            ))}
          </View>
        ) : null}
        <CreateGroupForm onCreated={(g) => open(g.id)} />
      </Section>
    </Screen>
  );
}

function initials(name: string): string {
  return name.split(/\s+/).filter(Boolean).slice(0, 2).map((w) => w[0]!.toUpperCase()).join('');
}

const styles = StyleSheet.create({
  me: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  avatar: { width: 44, height: 44, borderRadius: 22, backgroundColor: colors.accentSoft, alignItems: 'center', justifyContent: 'center' },
  avatarText: { ...type.heading, color: colors.accent },
  meText: { flex: 1, gap: 1 },
  name: { ...type.heading, color: colors.ink },
  email: { ...type.small, color: colors.inkMuted },
  row: { flexDirection: 'row' },
  muted: { ...type.small, color: colors.inkMuted },
  list: { marginHorizontal: -space.sm },
  group: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: 52, paddingHorizontal: space.sm, borderRadius: radius.md },
  groupOn: { backgroundColor: colors.paper },
  groupName: { ...type.heading, color: colors.ink, flex: 1 },
  chevron: { ...type.title, color: colors.inkFaint },
  unread: { ...type.label, color: colors.onAccent, backgroundColor: colors.accent, borderRadius: radius.pill, paddingHorizontal: space.sm, overflow: 'hidden' },
});
