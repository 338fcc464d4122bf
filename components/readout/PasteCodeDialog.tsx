// Paste a PD code, DT code or braid word: it is checked as typed, and drawn when accepted.
import { useState } from 'react';
import { StyleSheet, Text } from 'react-native';
import type { Diagram } from '@/shared/knot/diagram';
import { codeKinds, parseCode, type CodeKind } from '@/lib/slate/codes';
import { Button } from '@/components/ui/Button';
import { Choice } from '@/components/ui/Choice';
import { Dialog } from '@/components/ui/Dialog';
import { Field } from '@/components/ui/Field';
import { colors, type } from '@/constants/theme';

export function PasteCodeDialog({ visible, onClose, onDraw }: {
  visible: boolean;
  onClose: () => void;
  onDraw: (d: Diagram, braid?: number[]) => void;
}) {
  const [kind, setKind] = useState<CodeKind>('pd');
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  const info = codeKinds.find((c) => c.kind === kind)!;
  const submit = () => {
    const r = parseCode(kind, text);
    if (!r.ok) return setError(r.error);
    setError(null);
    setText('');
    onDraw(r.diagram, r.braid);
  };
  return (
    <Dialog title="Paste a code" visible={visible} onClose={onClose} actions={(
      <>
        <Button label="Draw it" onPress={submit} />
        <Button variant="quiet" label="Cancel" onPress={onClose} />
      </>
    )}>
      <Choice label="Kind of code" value={kind} onChange={(k) => (setKind(k), setError(null))} options={codeKinds.map((c) => ({ value: c.kind, label: c.label }))} />
      <Field
        label={info.label}
        mono
        multiline
        value={text}
        onChangeText={(t) => (setText(t), setError(null))}
        placeholder={info.example}
        autoCapitalize="none"
        autoCorrect={false}
        error={error}
        hint={kind === 'pd' ? 'Crossings X[a,b,c,d] or JSON, labels counterclockwise from the incoming under-strand.' : kind === 'braid' ? 'k is σₖ (a positive crossing), −k its inverse.' : 'Even numbers, one per crossing; a minus sign for an over-crossing.'}
      />
      <Text style={styles.note}>The drawing replaces the Slate; Undo brings the old one back.</Text>
    </Dialog>
  );
}

const styles = StyleSheet.create({
  note: { ...type.small, color: colors.inkMuted },
});
