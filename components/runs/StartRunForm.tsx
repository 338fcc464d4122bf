// Start a run from a pasted PD code or braid word: the code is checked here with the knot
// core (same messages as the server), then sent as a diagram; the result page opens. Small
// diagrams can also be computed on this device, offline (a web worker on web).
import { useEffect, useState } from 'react';
import { Pressable, StyleSheet, Text, TextInput, View } from 'react-native';
import { router } from 'expo-router';
import { isApiError } from '@/lib/api';
import { runPagePath, type KhResultJson, type StartRunRequest } from '@/shared/api/runs';
import { fromBraid, parseBraid } from '@/shared/knot/braid';
import { parsePD } from '@/shared/knot/pd';
import { useStartRun } from '@/hooks/queries/useRuns';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { Section } from '@/components/ui/Section';
import { colors, fonts, radius, space, type } from '@/constants/theme';
import { computeLocally, warmUpLocal } from './computeLocally';
import { KhTable } from './KhTable';
import { LOCAL_MAX_CROSSINGS } from './local-kh';
import { KhSummary } from './RunResult';

type Input = 'pd' | 'braid';
const rings = ['Z', 'Q', 'F2', 'F3'] as const;

function Choice<T extends string>({ label, options, value, onChange, names }: { label: string; options: readonly T[]; value: T; onChange: (v: T) => void; names?: Record<T, string> }) {
  return (
    <View style={styles.field}>
      <Text style={styles.label}>{label}</Text>
      <View role="radiogroup" aria-label={label} style={styles.choices}>
        {options.map((o) => (
          <Pressable key={o} role="radio" aria-checked={o === value} onPress={() => onChange(o)} style={[styles.choice, o === value && styles.chosen]}>
            <Text style={[styles.choiceText, o === value && styles.chosenText]}>{names?.[o] ?? o}</Text>
          </Pressable>
        ))}
      </View>
    </View>
  );
}

/** The request for the typed code, or the reason it is not a diagram. */
function request(input: Input, code: string, ring: string, reduced: boolean, sweep: number): StartRunRequest | string {
  try {
    const diagram = input === 'pd' ? { pd: parsePD(code) as [number, number, number, number][] } : (() => {
      const d = fromBraid(parseBraid(code));
      return { pd: d.pd.map((x) => [...x] as [number, number, number, number]), unknots: d.unknots };
    })();
    const text = input === 'braid' ? `braid ${code.trim().replace(/\s+/g, ' ')}` : `PD ${JSON.stringify(diagram.pd)}`;
    const label = text.length > 44 ? text.slice(0, 42) + '…' : text;
    return sweep > 0 ? { kind: 'cable-sweep', diagram, ring, reduced, sweep: { maxStrands: sweep }, label } : { diagram, ring, reduced, label };
  } catch (err) {
    return err instanceof Error ? err.message : 'Not a diagram';
  }
}

/** `sketchId` (from the Slate's "Start run"): the run is on that sketch as the server has it. */
export function StartRunForm({ initialPD, sketchId }: { initialPD?: string; sketchId?: string }) {
  const [input, setInput] = useState<Input>('pd');
  const [code, setCode] = useState(initialPD ?? '');
  const [onSketch, setOnSketch] = useState(!!sketchId);
  const [ring, setRing] = useState<(typeof rings)[number]>('Z');
  const [reduced, setReduced] = useState<'unreduced' | 'reduced'>('unreduced');
  const [kind, setKind] = useState<'kh' | 'sweep'>('kh');
  const [alsoS, setAlsoS] = useState(false);
  const [invalid, setInvalid] = useState<string | null>(null);
  const [local, setLocal] = useState<{ fraction: number; result?: KhResultJson; error?: string } | null>(null);
  const start = useStartRun();
  useEffect(warmUpLocal, []);
  const computeHere = () => {
    const body = request(input, code, ring, reduced === 'reduced', 0);
    if (typeof body === 'string') return setInvalid(body);
    const d = body.diagram!;
    if (d.pd.length > LOCAL_MAX_CROSSINGS) {
      return setInvalid(`On this device: at most ${LOCAL_MAX_CROSSINGS} crossings (this diagram has ${d.pd.length}); start a run on the server instead.`);
    }
    setInvalid(null);
    setLocal({ fraction: 0 });
    computeLocally({ pd: d.pd, unknots: d.unknots ?? 0, ring, reduced: reduced === 'reduced' }, (fraction) => setLocal((l) => (l && !l.result ? { ...l, fraction } : l)))
      .then((result) => setLocal({ fraction: 1, result }))
      .catch((err: Error) => setLocal({ fraction: 1, error: err.message }));
  };
  const submit = () => {
    const body = request(input, code, ring, reduced === 'reduced', kind === 'sweep' ? 2 : 0);
    if (typeof body === 'string') return setInvalid(body);
    body.computeS = alsoS && kind === 'kh';
    setInvalid(null);
    const open = { onSuccess: (run: { id: string }) => router.push(runPagePath(run.id)) };
    if (!onSketch || !sketchId) return start.mutate(body, open);
    const { diagram: _d, label: _l, ...rest } = body;
    start.mutate({ ...rest, sketchId }, {
      ...open,
      // Not synced to the server yet: run the code as pasted instead.
      onError: (err) => isApiError(err, 'not_found') && (setOnSketch(false), start.mutate(body, open)),
    });
  };
  return (
    <View style={styles.form}>
      {onSketch ? <Banner tone="info">On the sketch as it was last synced to the server; its PD code is below.</Banner> : null}
      <Choice label="Input" options={['pd', 'braid'] as const} value={input} onChange={setInput} names={{ pd: 'PD code', braid: 'Braid word' }} />
      <View style={styles.field}>
        <Text style={styles.label}>{input === 'pd' ? 'PD code' : 'Braid word'}</Text>
        <TextInput
          value={code}
          onChangeText={setCode}
          multiline
          aria-label={input === 'pd' ? 'PD code' : 'Braid word'}
          placeholder={input === 'pd' ? '[[4,2,5,1],[2,6,3,5],[6,4,1,3]]' : '1 1 1'}
          placeholderTextColor={colors.inkFaint}
          style={styles.code}
        />
        {invalid ? <Text role="alert" style={styles.error}>{invalid}</Text> : null}
      </View>
      <Choice label="Ring" options={rings} value={ring} onChange={setRing} />
      <Choice label="Homology" options={['unreduced', 'reduced'] as const} value={reduced} onChange={setReduced} names={{ unreduced: 'Unreduced', reduced: 'Reduced' }} />
      <Choice label="Computation" options={['kh', 'sweep'] as const} value={kind} onChange={setKind} names={{ kh: 'Khovanov homology', sweep: 'Cable sweep, r+ + r- ≤ 2' }} />
      {kind === 'kh' ? (
        // The server refuses it for a link, saying s is defined for knots here.
        <Pressable role="checkbox" aria-checked={alsoS} aria-label="Also compute s" onPress={() => setAlsoS(!alsoS)} style={[styles.choice, styles.check, alsoS && styles.chosen]}>
          <Text style={[styles.choiceText, alsoS && styles.chosenText]}>{`${alsoS ? '☑' : '☐'} Also compute s (Rasmussen invariant, knots only)`}</Text>
        </Pressable>
      ) : null}
      {start.error && !(onSketch && isApiError(start.error, 'not_found')) ? <Banner tone="error">{start.error.message}</Banner> : null}
      <Button label="Start run" busy={start.isPending} busyLabel="Starting…" onPress={submit} />
      {kind === 'kh' ? (
        <Button variant="secondary" label={`Compute on this device (up to ${LOCAL_MAX_CROSSINGS} crossings)`} busy={!!local && !local.result && !local.error} busyLabel="Computing on this device…" onPress={computeHere} />
      ) : null}
      {local?.error ? <Banner tone="error">{local.error}</Banner> : null}
      {local?.result ? (
        <Section title={`On this device: Khovanov homology over ${local.result.ring}${local.result.reduced ? ', reduced' : ''}`}>
          <KhTable groups={local.result.groups} ring={local.result.ring} label="Khovanov homology on this device" />
          <KhSummary result={local.result} />
        </Section>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  field: { gap: space.xs },
  label: { ...type.label, color: colors.inkMuted },
  choices: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  choice: { paddingHorizontal: space.md, paddingVertical: space.sm, borderRadius: radius.pill, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  check: { alignSelf: 'flex-start' },
  chosen: { backgroundColor: colors.accent, borderColor: colors.accent },
  choiceText: { ...type.small, color: colors.ink },
  chosenText: { color: colors.onAccent, fontFamily: fonts.medium },
  code: { fontFamily: fonts.mono, fontSize: 14, minHeight: 72, borderWidth: 1, borderColor: colors.line, borderRadius: radius.sm, padding: space.md, backgroundColor: colors.surface, color: colors.ink },
  error: { ...type.small, color: colors.danger },
});
