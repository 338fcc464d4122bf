// Who drew a shared sketch and when, where it was seen, what it was forked from, its tags.
import { StyleSheet, Text } from 'react-native';
import { useRouter } from 'expo-router';
import type { GroupSketch } from '@/shared/api/feed';
import { colors, type } from '@/constants/theme';
import { when } from '@/lib/when';

export function SketchProvenance({ s, groupId }: { s: GroupSketch; groupId: string }) {
  const router = useRouter();
  return (
    <>
      <Text style={styles.meta}>
        {s.owner.displayName} · {when(s.updatedAt)}{s.seenAt ? ` · seen at ${s.seenAt}` : ''}
      </Text>
      {s.forkedFrom ? (
        <Text style={styles.meta}>
          Forked from <Text role="link" style={styles.link} onPress={() => router.push(`/feed/${groupId}/${s.forkedFrom!.id}`)}>{s.forkedFrom.title || 'Untitled sketch'}</Text> by {s.forkedFrom.owner.displayName}
        </Text>
      ) : null}
      {s.tags.length ? <Text style={styles.tags}>{s.tags.map((t) => `#${t}`).join('  ')}</Text> : null}
    </>
  );
}

const styles = StyleSheet.create({
  meta: { ...type.small, color: colors.inkMuted },
  tags: { ...type.label, color: colors.accent },
  link: { ...type.body, color: colors.accent },
});
