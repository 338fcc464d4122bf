// My notifications, newest first (tap one to open what it is about; it is then read), and
// which kinds also come by e-mail.
import { Pressable, StyleSheet, Switch, Text, View } from 'react-native';
import { useRouter, type Href } from 'expo-router';
import { notificationKinds, type Notification, type NotificationKind } from '@/shared/api/notifications';
import { useMarkRead, useNotifications, useSaveSettings, useSettings } from '@/hooks/queries/useNotifications';
import { commentPlainText } from '@/shared/text/comment-markdown';
import { when } from '@/lib/when';
import { Screen } from '@/components/ui/Screen';
import { PageTitle } from '@/components/ui/PageTitle';
import { Section } from '@/components/ui/Section';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { colors, radius, space, type } from '@/constants/theme';

const kindLabels: Record<NotificationKind, string> = {
  comment: 'New comments on my sketches',
  run_finished: 'My runs finishing',
  invitation_accepted: 'People accepting my invitations',
};

function describe(n: Notification): { text: string; href: Href } {
  switch (n.kind) {
    case 'comment':
      return { text: `${n.payload.author} commented on “${n.payload.sketchTitle || 'Untitled sketch'}”: ${commentPlainText(n.payload.excerpt)}`, href: `/feed/${n.payload.groupId}/${n.payload.sketchId}` };
    case 'run_finished':
      return { text: `Your run on “${n.payload.sketchTitle || 'Untitled sketch'}” ${n.payload.status}. ${n.payload.summary}`, href: `/runs/${n.payload.runId}` };
    case 'invitation_accepted':
      return { text: `${n.payload.who} joined ${n.payload.groupName} as ${n.payload.role}.`, href: `/account/groups/${n.payload.groupId}` };
  }
}

export function NotificationsPage({ onBack }: { onBack?: () => void }) {
  const router = useRouter();
  const list = useNotifications();
  const read = useMarkRead();
  const settings = useSettings();
  const save = useSaveSettings();
  return (
    <Screen>
      <PageTitle kicker="Account" title="Notifications" onBack={onBack} backLabel="Account" />
      <Section title={list.data ? `Recent · ${list.data.unread} unread` : 'Recent'}>
        {list.isError ? <Banner tone="error">{list.error.message}</Banner> : null}
        {list.data?.items.length === 0 ? <Text style={styles.muted}>Nothing yet. Comments on your sketches, finished runs and accepted invitations show here.</Text> : null}
        <View role="list">
          {list.data?.items.map((n) => {
            const d = describe(n);
            return (
              <Pressable key={n.id} role="link" onPress={() => { if (!n.readAt) read.mutate(n.id); router.push(d.href); }}
                style={[styles.item, !n.readAt && styles.unread]} testID={`notification-${n.kind}`}>
                {!n.readAt ? <View style={styles.dot} aria-label="unread" /> : null}
                <View style={styles.itemBody}>
                  <Text style={styles.text}>{d.text}</Text>
                  <Text style={styles.muted}>{when(n.createdAt)}</Text>
                </View>
              </Pressable>
            );
          })}
        </View>
        {list.data && list.data.unread > 0 ? (
          <View style={styles.row}><Button variant="secondary" label="Mark all read" busy={read.isPending} onPress={() => read.mutate(null)} /></View>
        ) : null}
      </Section>
      <Section title="E-mail me about" note="Notifications always appear here; these choose which also come by e-mail.">
        {settings.data
          ? notificationKinds.map((k) => (
              <View key={k} style={styles.setting}>
                <Text style={styles.text}>{kindLabels[k]}</Text>
                <Switch aria-label={kindLabels[k]} value={settings.data.email[k]} trackColor={{ true: colors.accent, false: colors.line }}
                  onValueChange={(v) => save.mutate({ email: { ...settings.data.email, [k]: v } })} />
              </View>
            ))
          : null}
        {save.error ? <Banner tone="error">{save.error.message}</Banner> : null}
      </Section>
    </Screen>
  );
}

const styles = StyleSheet.create({
  item: { flexDirection: 'row', gap: space.sm, paddingVertical: space.md, paddingHorizontal: space.sm, borderRadius: radius.md, alignItems: 'flex-start' },
  unread: { backgroundColor: colors.accentSoft },
  dot: { width: 8, height: 8, borderRadius: 4, backgroundColor: colors.accent, marginTop: 8 },
  itemBody: { flex: 1, gap: 2 },
  text: { ...type.body, color: colors.ink, flex: 1 },
  muted: { ...type.small, color: colors.inkMuted },
  row: { flexDirection: 'row' },
  setting: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: 44 },
});
