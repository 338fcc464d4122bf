// The Families builder: choose a family and its parameters, then replace the sketch with it or
// combine it (connected sum, disjoint union), mirrored if wanted. Cables act on the sketch.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Sketch } from '@/shared/drawing/sketch';
import type { Diagram } from '@/shared/knot/diagram';
import { buildFamily, familyList, type FamilyKind, type Placement } from '@/lib/slate/families';
import { currentDoc, useSlate } from '@/lib/slate/slate-store';
import { Button } from '@/components/ui/Button';
import { Banner } from '@/components/ui/Banner';
import { Choice } from '@/components/ui/Choice';
import { Dialog } from '@/components/ui/Dialog';
import { Field } from '@/components/ui/Field';
import { colors, space, type } from '@/constants/theme';

const initialValues = () => Object.fromEntries(familyList.flatMap((f) => f.fields.map((x) => [`${f.kind}.${x.key}`, x.initial])));

export function FamiliesDialog({ visible, onClose, current, onDraw }: {
  visible: boolean;
  onClose: () => void;
  current: Diagram | null;
  onDraw: (d: Diagram, braid?: number[], sketch?: Sketch | null) => void;
}) {
  const [kind, setKind] = useState<FamilyKind>('torus');
  const [values, setValues] = useState<Record<string, string>>(initialValues);
  const [placement, setPlacement] = useState<Placement>('replace');
  const [mirrored, setMirrored] = useState<'no' | 'yes'>('no');
  const [error, setError] = useState<string | null>(null);
  const family = familyList.find((f) => f.kind === kind)!;
  const submit = () => {
    const own = Object.fromEntries(family.fields.map((x) => [x.key, values[`${kind}.${x.key}`]]));
    const r = buildFamily(kind, own, current, placement, mirrored === 'yes', currentDoc(useSlate.getState()).sketch);
    if (!r.ok) return setError(r.error);
    setError(null);
    onDraw(r.diagram, r.braid, r.sketch);
  };
  return (
    <Dialog title="Families" visible={visible} onClose={onClose} wide actions={(
      <>
        <Button label="Draw it" onPress={submit} />
        <Button variant="quiet" label="Cancel" onPress={onClose} />
      </>
    )}>
      <Choice label="Family" value={kind} onChange={(k) => (setKind(k), setError(null))} options={familyList.map((f) => ({ value: f.kind, label: f.label }))} />
      <View style={styles.fields}>
        {family.fields.map((x) => (
          <View key={x.key} style={styles.field}>
            <Field label={x.label} hint={x.hint} mono value={values[`${kind}.${x.key}`]} autoCapitalize="none"
              onChangeText={(t) => (setValues((v) => ({ ...v, [`${kind}.${x.key}`]: t })), setError(null))} />
          </View>
        ))}
      </View>
      {family.fromSketch ? null : (
        <View style={styles.group}>
          <Text style={styles.label}>Put it on the Slate</Text>
          <Choice label="Placement" value={placement} onChange={setPlacement} options={[
            { value: 'replace', label: 'Replace the sketch' },
            { value: 'sum', label: 'Connected sum' },
            { value: 'union', label: 'Disjoint union' },
          ]} />
        </View>
      )}
      <View style={styles.group}>
        <Text style={styles.label}>Mirror</Text>
        <Choice label="Mirror" value={mirrored} onChange={setMirrored} options={[{ value: 'no', label: 'As given' }, { value: 'yes', label: 'Mirror image' }]} />
      </View>
      {error ? <Banner tone="error">{error}</Banner> : null}
    </Dialog>
  );
}

const styles = StyleSheet.create({
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  field: { flexBasis: 200, flexGrow: 1 },
  group: { gap: space.xs + 2 },
  label: { ...type.label, color: colors.ink },
});
