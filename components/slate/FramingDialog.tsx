// Set a component's framing: an integer, or back to the blackboard framing.
import { useEffect, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/ui/Button';
import { Dialog } from '@/components/ui/Dialog';
import { Field } from '@/components/ui/Field';
import { colors, space, type } from '@/constants/theme';

export function FramingDialog({ visible, number, framing, blackboard, onClose, onSet }: {
  visible: boolean;
  number: number | null;
  framing: number | null;
  /** The blackboard framing of the component (its self-writhe), when known. */
  blackboard: number | null;
  onClose: () => void;
  onSet: (f: number | null) => void;
}) {
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    if (!visible) return;
    setText(framing === null ? '' : String(framing));
    setError(null);
  }, [visible, framing]);
  const submit = () => {
    const t = text.trim().replace('−', '-');
    if (t === '') return onSet(null);
    if (!/^[+-]?\d+$/.test(t)) return setError('The framing is an integer, e.g. -1, 0 or 2.');
    onSet(Number(t));
  };
  return (
    <Dialog title={number ? `Framing of component ${number}` : 'Framing'} visible={visible} onClose={onClose}>
      <Text style={styles.body}>
        Now {framing === null ? `the blackboard framing${blackboard !== null ? ` (${blackboard})` : ''}` : framing}. Leave the field empty for the blackboard framing: the writhe of the component's own crossings.
      </Text>
      <Field label="Framing" value={text} onChangeText={(t) => (setText(t), setError(null))} keyboardType="numbers-and-punctuation" mono error={error} placeholder="blackboard" onSubmitEditing={submit} />
      <View style={styles.row}>
        <Button label="Set framing" onPress={submit} />
        <Button variant="secondary" label="Blackboard" onPress={() => onSet(null)} />
      </View>
    </Dialog>
  );
}

const styles = StyleSheet.create({
  body: { ...type.small, color: colors.inkMuted },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
