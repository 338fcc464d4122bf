// Below the Slate with the Bands tool: why the last band was refused, or why the bands as they
// stand cannot be read; the open band's half
// twists (a stepper) and Delete; and the "After the bands" switch with the component count.
import { StyleSheet, Text, View } from 'react-native';
import { bandsOf, deleteBand, setBandTwists } from '@/shared/drawing/bands';
import { useSlate } from '@/lib/slate/slate-store';
import { colors, space, type } from '@/constants/theme';
import { ToolChip as Chip } from '@/components/ui/ToolChip';

export function BandBar({ afterComponents, refused }: { afterComponents: number | null; refused: string | null }) {
  const tool = useSlate((s) => s.tool);
  const notice = useSlate((s) => s.bandNotice);
  const selected = useSlate((s) => s.selectedBand);
  const showAfter = useSlate((s) => s.showAfter);
  const doc = useSlate((s) => s.history.present);
  const bands = bandsOf(doc.sketch);
  if (bands.length === 0 && tool !== 'bands' && !notice) return null;
  const s = useSlate.getState();
  const k = bands.findIndex((b) => b.id === selected);
  const band = k >= 0 ? bands[k] : null;
  const edit = (sketch: typeof doc.sketch) => s.apply({ ...doc, sketch });
  return (
    <View style={styles.bar} testID="band-bar">
      {notice ? <Text style={styles.notice} role="alert">{notice}</Text> : null}
      {refused && refused !== notice ? <Text style={styles.notice} testID="band-refused">{refused}</Text> : null}
      {band ? (
        <View style={styles.row}>
          <Text style={styles.text}>Band {k + 1}: half twists</Text>
          <Chip label="One half twist fewer" text="−" onPress={() => edit(setBandTwists(doc.sketch, band.id, band.twists - 1))} />
          <Text style={styles.count} testID="band-twists">{band.twists}</Text>
          <Chip label="One half twist more" text="+" onPress={() => edit(setBandTwists(doc.sketch, band.id, band.twists + 1))} />
          <Chip label="Delete band" onPress={() => (edit(deleteBand(doc.sketch, band.id)), s.selectBand(null))} />
        </View>
      ) : tool === 'bands' && !notice ? (
        <Text style={styles.text}>Drag from one strand to another to draw a band; tap a ringed crossing to pass over or under; tap a band's number for its twists.</Text>
      ) : null}
      {bands.length > 0 ? (
        <View style={styles.row}>
          <Chip label="After the bands" on={showAfter} onPress={() => s.setShowAfter(!showAfter)} />
          {afterComponents !== null ? <Text style={styles.text} testID="after-count">After the bands: {afterComponents} {afterComponents === 1 ? 'component' : 'components'}</Text> : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { gap: space.xs, paddingHorizontal: space.md, paddingVertical: space.sm, backgroundColor: colors.sunken, borderTopWidth: 1, borderTopColor: colors.line },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  text: { ...type.small, color: colors.ink },
  count: { ...type.heading, color: colors.ink, minWidth: 24, textAlign: 'center' },
  notice: { ...type.small, color: colors.danger },
});
