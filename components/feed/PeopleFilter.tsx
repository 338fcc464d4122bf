// The Feed's filter by person. The chips wrap: a scrolling row cut the last name off at the
// screen's edge ("Pri…") with no sign that more followed. So that a big group does not push the
// feed below the fold, names past the first few wait behind a chip that says how many there are.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '@/constants/theme';
import { Chip } from './Chip';

export const PEOPLE_SHOWN = 6;

type Person = { userId: string; displayName: string };

export function PeopleFilter({ people, person, onPick }: { people: readonly Person[]; person?: string; onPick: (userId: string | undefined) => void }) {
  const [all, setAll] = useState(false);
  // The chosen person stays in sight even when the rest are folded away.
  const shown = all ? people : people.filter((p, i) => i < PEOPLE_SHOWN || p.userId === person);
  const hidden = people.length - shown.length;
  return (
    <View style={styles.people} role="group" aria-label="Filter by person">
      <Chip label="Everyone" on={!person} onPress={() => onPick(undefined)} />
      {shown.map((m) => <Chip key={m.userId} label={m.displayName} on={person === m.userId} onPress={() => onPick(m.userId)} />)}
      {hidden > 0 ? <Chip label={`${hidden} more`} on={false} onPress={() => setAll(true)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  people: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
