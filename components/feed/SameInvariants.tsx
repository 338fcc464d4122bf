// The sketches of the group whose invariants match this one's, as links, with how many more.
import { StyleSheet, Text, View } from 'react-native';
import { useRouter } from 'expo-router';
import type { GroupSketch } from '@/shared/api/feed';
import { Section } from '@/components/ui/Section';
import { colors, space, type } from '@/constants/theme';

export function SameInvariants({ s, groupId }: { s: GroupSketch; groupId: string }) {
  const router = useRouter();
  if (!s.sameInvariants.length) return null;
  const more = s.sameInvariantsTotal - s.sameInvariants.length;
  return (
    <Section title={`Same invariants as · ${s.sameInvariantsTotal}`} note="Same Jones polynomial, determinant and signature (so maybe the same knot drawn another way), or the same Khovanov result.">
      <View style={styles.refs}>
        {s.sameInvariants.map((r) => (
          <Text key={r.id} role="link" style={styles.link} onPress={() => router.push(`/feed/${groupId}/${r.id}`)}>
            {r.title || 'Untitled sketch'} <Text style={styles.muted}>by {r.owner.displayName}</Text>
          </Text>
        ))}
      </View>
      {more > 0 ? <Text style={styles.muted}>{`and ${more} more`}</Text> : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  refs: { gap: space.sm },
  link: { ...type.body, color: colors.accent },
  muted: { ...type.small, color: colors.inkMuted },
});
