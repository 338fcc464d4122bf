// Start a run from a pasted PD, DT code or braid word: the code is read by the Slate's reader
// (lib/slate/codes.ts: the same codes, the same messages), then sent as a diagram with the text
// it came from; the result page opens. Small diagrams can also be computed on this device,
// offline (a web worker on web), with s when asked for a knot.
import { useEffect, useState } from 'react';
import { StyleSheet, Text, TextInput, View } from 'react-native';
import { router } from 'expo-router';
import { isApiError } from '@/lib/api';
import { codeKinds, parseCode, sourceOf, type CodeKind } from '@/lib/slate/codes';
import { RunRing, runPagePath, type KhResultJson, type RunDiagram, type StartRunRequest } from '@/shared/api/runs';
import { pdToText } from '@/shared/text/codes';
import { useStartRun } from '@/hooks/queries/useRuns';
import { useLocalSketch } from '@/hooks/queries/useLocalSketches';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { Checkbox } from '@/components/ui/Checkbox';
import { Choice } from '@/components/ui/Choice';
import { Section } from '@/components/ui/Section';
import { colors, fonts, radius, space, type } from '@/constants/theme';
import { computeLocally, warmUpLocal } from './computeLocally';
import { CableCopies, CablePair } from './CableWords';
import { KhTable } from './KhTable';
import { LOCAL_MAX_CROSSINGS } from './local-kh';
import { KhSummary } from './RunResult';
import { SliceBounds } from '@/components/ui/SliceBounds';
import { TeX } from '@/components/ui/Math';
import { computeS } from '@/lib/on-device/computeS';
import { orient } from '@/shared/knot/pd';
import { minus } from '@/shared/text/integers';

// Typeset as the result tables write their groups (ℤ, ℤ/2); 𝔽ₚ asks for its prime in a field of its own.
const ringNames = { Z: 'ℤ', Q: 'ℚ', F2: '𝔽₂', F3: '𝔽₃', Fp: '𝔽ₚ' } as const;
const ringTeX = { Z: '\\mathbb{Z}', Q: '\\mathbb{Q}', F2: '\\mathbb{F}_2', F3: '\\mathbb{F}_3', Fp: '\\mathbb{F}_p' } as const;
const sweepNames = { '0': 'Khovanov homology', '2': 'Cable sweep, up to 2 strands', '3': 'Cable sweep, up to 3 strands', '4': 'Cable sweep, up to 4 strands' } as const;
const inputNames = Object.fromEntries(codeKinds.map((c) => [c.kind, c.label])) as Record<CodeKind, string>;
const LABEL_MAX = 120;

/** A visible caption over a segmented choice whose options are `names`' keys, in order. */
function Labelled<T extends string>({ label, names, tex, value, onChange }: { label: string; names: Record<T, string>; tex?: Record<T, string>; value: T; onChange: (v: T) => void }) {
  const options = (Object.keys(names) as T[]).map((v) => ({ value: v, label: names[v], tex: tex?.[v] }));
  return (
    <View style={styles.field}>
      <Text style={styles.label}>{label}</Text>
      <Choice label={label} options={options} value={value} onChange={onChange} />
    </View>
  );
}

/** The request for the typed code, or the reason it is not a diagram (or the ring not a ring). */
function request(input: CodeKind, code: string, ring: string, reduced: boolean, sweep: number): StartRunRequest | string {
  if (!RunRing.safeParse(ring).success) return `${ring.slice(1) || 'p'} is not a prime; p must be a prime, e.g. 5.`;
  const parsed = parseCode(input, code);
  if (!parsed.ok) return parsed.error;
  const d = parsed.diagram;
  const diagram = { pd: d.pd.map((x) => [...x] as [number, number, number, number]), unknots: d.unknots };
  // A PD code is its own input; a braid or DT code is kept as typed, in full, beside its PD code.
  const source = input === 'pd' ? undefined : sourceOf(input, code);
  const text = source ?? `PD ${pdToText(d.pd)}`;
  const label = text.length > LABEL_MAX ? text.slice(0, LABEL_MAX - 1) + '…' : text;
  const base = { diagram, ring, reduced, label, source };
  return sweep > 0 ? { ...base, kind: 'cable-sweep', sweep: { maxStrands: sweep } } : base;
}

/** `sketchId` (from the Slate's "Start run"): the run is on that sketch as the server has it. */
export function StartRunForm({ initialPD, sketchId }: { initialPD?: string; sketchId?: string }) {
  const [input, setInput] = useState<CodeKind>('pd');
  const [code, setCode] = useState(initialPD ?? '');
  const [onSketch, setOnSketch] = useState(!!sketchId);
  const [ringChoice, setRingChoice] = useState<keyof typeof ringNames>('Z');
  const [prime, setPrime] = useState('5');
  const ring = ringChoice === 'Fp' ? `F${prime.trim()}` : ringChoice;
  const [reduced, setReduced] = useState<'unreduced' | 'reduced'>('unreduced');
  const [alsoS, setAlsoS] = useState(false);
  const [sweep, setSweep] = useState<keyof typeof sweepNames>('0');
  const [invalid, setInvalid] = useState<string | null>(null);
  const [local, setLocal] = useState<{ fraction: number; result?: KhResultJson; error?: string } | null>(null);
  const [localS, setLocalS] = useState<{ s: number; diagram: Pick<RunDiagram, 'pd' | 'unknots'> } | { note: string } | null>(null);
  const start = useStartRun();
  // The device holds the sketches a run can be started from (mine and my groups').
  const sketch = useLocalSketch(sketchId ?? '').data;
  const named = sketch ? `“${sketch.title || 'Untitled sketch'}”` : 'the sketch';
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
    setLocalS(null);
    const unknots = d.unknots ?? 0;
    computeLocally({ pd: d.pd, unknots, ring, reduced: reduced === 'reduced' }, (fraction) => setLocal((l) => (l && !l.result ? { ...l, fraction } : l)))
      .then((result) => {
        setLocal({ fraction: 1, result });
        if (!alsoS) return;
        // As on the server: s of a knot only (docs/conventions.md), after its homology.
        if (orient(d.pd).components.length + unknots !== 1) return setLocalS({ note: 's is defined for knots here; this diagram is a link.' });
        setLocalS({ note: 'Computing s on this device…' });
        computeS({ pd: d.pd, unknots }, new AbortController().signal)
          .then((value) => setLocalS({ s: value, diagram: { pd: d.pd, unknots } }))
          .catch((err: Error) => setLocalS({ note: err.message }));
      })
      .catch((err: Error) => setLocal({ fraction: 1, error: err.message }));
  };
  const submit = () => {
    const body = request(input, code, ring, reduced === 'reduced', Number(sweep));
    if (typeof body === 'string') return setInvalid(body);
    body.computeS = alsoS && sweep === '0';
    setInvalid(null);
    const open = { onSuccess: (run: { id: string }) => router.push(runPagePath(run.id)) };
    if (!onSketch || !sketchId) return start.mutate(body, open);
    const { diagram: _d, label: _l, source: _s, ...rest } = body;
    start.mutate({ ...rest, sketchId }, {
      ...open,
      // Not synced to the server yet: run the code as pasted instead.
      onError: (err) => isApiError(err, 'not_found') && (setOnSketch(false), start.mutate(body, open)),
    });
  };
  return (
    <View style={styles.form}>
      {onSketch ? <Banner tone="info">{`On ${named} as it was last synced to the server; its PD code is below. Edit the code to run what you type instead.`}</Banner> : null}
      {/* An edited code is what the person means to run: it leaves the sketch (never ignored for it). */}
      <Labelled label="Input" names={inputNames} value={input} onChange={(k) => (setInput(k), setOnSketch(false))} />
      <View style={styles.field}>
        <Text style={styles.label}>{inputNames[input]}</Text>
        <TextInput
          value={code}
          onChangeText={(t) => (setCode(t), setOnSketch(false))}
          multiline
          aria-label={inputNames[input]}
          placeholder={codeKinds.find((c) => c.kind === input)!.example}
          placeholderTextColor={colors.inkFaint}
          style={styles.code}
        />
        {invalid ? <Text role="alert" style={styles.error}>{invalid}</Text> : null}
      </View>
      <Labelled label="Ring" names={ringNames} tex={ringTeX} value={ringChoice} onChange={setRingChoice} />
      {ringChoice === 'Fp' ? (
        <View style={styles.field}>
          <Text style={styles.label}>Prime p</Text>
          <TextInput value={prime} onChangeText={setPrime} inputMode="numeric" aria-label="Prime p" style={[styles.code, styles.prime]} />
        </View>
      ) : null}
      <Labelled label="Homology" names={{ unreduced: 'Unreduced', reduced: 'Reduced' }} value={reduced} onChange={setReduced} />
      <Labelled label="Computation" names={sweepNames} value={sweep} onChange={setSweep} />
      {/* In the words of the sweep's result page (SweepGrid), where its cells are laid out by (r₊, r₋). */}
      {sweep !== '0' ? <Text style={styles.label}>Each component takes every <CablePair /> with <TeX tex="r_+ + r_-" text="r₊ + r₋" nowrap /> from 1 up to {sweep}: <CableCopies /></Text> : null}
      {sweep === '0' ? (
        // The server refuses it for a link, saying s is defined for knots here.
        <Checkbox label="Also compute s (Rasmussen invariant, knots only)" on={alsoS} onPress={() => setAlsoS(!alsoS)} />
      ) : null}
      {start.error && !(onSketch && isApiError(start.error, 'not_found')) ? <Banner tone="error">{start.error.message}</Banner> : null}
      <Button label="Start run" busy={start.isPending} busyLabel="Starting…" onPress={submit} />
      {sweep === '0' ? (
        <Button variant="secondary" label={`Compute on this device (up to ${LOCAL_MAX_CROSSINGS} crossings)`} busy={!!local && !local.result && !local.error} busyLabel="Computing on this device…" onPress={computeHere} />
      ) : null}
      {local?.error ? <Banner tone="error">{local.error}</Banner> : null}
      {local?.result ? (
        <Section title={`On this device: Khovanov homology over ${local.result.ring}${local.result.reduced ? ', reduced' : ''}`}>
          <KhTable groups={local.result.groups} ring={local.result.ring} label="Khovanov homology on this device" />
          <KhSummary result={local.result} />
          {localS && 's' in localS ? (
            <View testID="local-s">
              <Text style={styles.value}>{`s = ${minus(localS.s)} over Q (Rasmussen)`}</Text>
              <SliceBounds s={localS.s} diagram={localS.diagram} />
            </View>
          ) : localS ? <Text role="status" style={styles.label}>{localS.note}</Text> : null}
        </Section>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  field: { gap: space.xs },
  label: { ...type.label, color: colors.inkMuted },
  prime: { minHeight: 0, width: 120 },
  code: { fontFamily: fonts.mono, fontSize: 14, minHeight: 72, borderWidth: 1, borderColor: colors.line, borderRadius: radius.sm, padding: space.md, backgroundColor: colors.surface, color: colors.ink },
  error: { ...type.small, color: colors.danger },
  value: { ...type.body, color: colors.ink },
});
