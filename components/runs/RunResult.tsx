// A run's page: where it stands (status, progress, cancel), then its result: the bigraded
// table, the Poincare polynomial, the Euler characteristic checked against the Jones
// polynomial, thin or thick, the s-invariant with its slice-genus bounds when asked, and exports. A cable sweep shows a grid of small tables instead.
// A bands run shows its certificate first; its table is of the diagram after the bands.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { isFinished, runPagePath, type BandsResultJson, type KhResultJson, type RunDetail, type SValues } from '@/shared/api/runs';
import { toCsv, toJson, toLatexTable, type ExportRecord } from '@/shared/khovanov/export';
import { poincareFormat } from '@/shared/khovanov/format';
import { Laurent } from '@/shared/poly/laurent';
import { router } from 'expo-router';
import { useCancelRun, useStartRun } from '@/hooks/queries/useRuns';
import { pdToText } from '@/shared/text/codes';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { Section } from '@/components/ui/Section';
import { colors, fonts, space, type } from '@/constants/theme';
import { KhTable } from './KhTable';
import { RingName } from './RingName';
import { useRunFocus } from './focus-store';
import { useIsWide } from '@/components/shell/useIsWide';
import { TeX } from '@/components/ui/Math';
import { ProgressBar } from './ProgressBar';
import { SliceBounds } from '@/components/ui/SliceBounds';
import { SweepGrid } from './SweepGrid';
import { duration, remaining, runDate, statusLabel } from '@/lib/run-format';
import { saveText } from '@/components/ui/save';
import { minus } from '@/shared/text/integers';

function Fact({ name, children }: { name: string; children: React.ReactNode }) {
  return (
    <View style={styles.fact}>
      <Text style={styles.factName}>{name}</Text>
      <View style={styles.factValue}>{typeof children === 'string' ? <Text style={styles.value}>{children}</Text> : children}</View>
    </View>
  );
}

/** A file name a user can find again: the diagram's label, the ring, the run's short id. */
const exportName = (run: { id: string; label: string; ring: string; reduced: boolean }) => {
  const slug = run.label.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 40);
  return ['kh', slug, run.ring + (run.reduced ? '-reduced' : ''), run.id.slice(0, 8)].filter(Boolean).join('-');
};

/** What an export of this run (or sweep cell) says about it; a bands run's table is of the diagram after the bands. */
export const exportRecord = (run: RunDetail | RunDetail['children'][number], diagram: RunDetail['diagram'], result: KhResultJson): ExportRecord => ({
  runId: run.id,
  label: run.label,
  diagram: result.bands ? { pd: result.bands.after.pd, unknots: result.bands.after.unknots } : { pd: diagram.pd, unknots: diagram.unknots },
  source: run.source,
  date: run.finishedAt ?? run.createdAt,
  result,
});

export function Exports({ record, base }: { record: ExportRecord; base: string }) {
  const [note, setNote] = useState<string | null>(null);
  const save = (ext: string, text: string, mime: string) => void saveText(`${base}.${ext}`, text, mime).then(setNote);
  return (
    <View style={styles.exports}>
      <Button variant="secondary" label="LaTeX table" onPress={() => save('tex', toLatexTable(record), 'text/x-tex')} />
      <Button variant="secondary" label="CSV" onPress={() => save('csv', toCsv(record), 'text/csv')} />
      <Button variant="secondary" label="JSON" onPress={() => save('json', toJson(record), 'application/json')} />
      {note ? <Text role="status" style={styles.muted}>{note}</Text> : null}
    </View>
  );
}

export function KhSummary({ result }: { result: KhResultJson }) {
  const euler = result.euler;
  const poly = (pairs: [number, string][]) => Laurent.fromJSON(pairs);
  return (
    <View style={styles.facts}>
      <Fact name="Poincaré polynomial">
        <TeX tex={poincareFormat(result.poincare, 'tex')} text={poincareFormat(result.poincare, 'text')} />
      </Fact>
      {euler ? (
        <Fact name="Euler characteristic">
          <View style={styles.euler}>
            <TeX tex={poly(euler.computed).format('q', 'latex')} text={poly(euler.computed).format('q')} />
            <Text style={[styles.value, { color: euler.ok ? colors.success : colors.danger }]} testID="run-euler-check">
              {`${euler.ok ? '=' : '≠'} ${result.reduced ? 'V' : '(q + q⁻¹) V'} at `}
              <TeX tex="t^{1/2} = -q" text="t^(1/2) = −q" />
              {euler.ok ? ', as the Jones polynomial says ✓' : ': it differs from the Jones polynomial, which gives'}
            </Text>
            {euler.ok ? null : <TeX tex={poly(euler.expected).format('q', 'latex')} text={poly(euler.expected).format('q')} />}
          </View>
        </Fact>
      ) : null}
      <Fact name="Width">{`${result.width} diagonal${result.width === 1 ? '' : 's'}: ${result.thin ? 'thin' : 'thick'}`}</Fact>
    </View>
  );
}

/** s over Q and F2, and the slice-genus bounds from s (over Q) and the diagram's signature. */
function SFact({ s, diagram }: { s: SValues; diagram: RunDetail['diagram'] }) {
  return (
    <Fact name="Rasmussen s">
      <View style={styles.euler}>
        <Text style={styles.value} testID="run-s">{`s = ${minus(s.Q)} over Q, ${minus(s.F2)} over F2`}</Text>
        <SliceBounds s={s.Q} diagram={diagram} />
      </View>
    </Fact>
  );
}

/** What a bands run certifies (shared/knot/bands/certificate.ts): the unlink, chi, the genus bound, ribbon. */
function BandsFact({ bands }: { bands: BandsResultJson }) {
  const c = bands.components;
  const target = `the ${c}-component unlink`;
  const verdict =
    bands.unlink === 'crossingless' ? `${target} (simplification leaves no crossing)`
      : bands.unlink === 'khovanov' ? `${target} (certified by Khovanov homology over Z)`
        : `${c} component${c === 1 ? '' : 's'}, not certified to be an unlink: its Khovanov homology is not the unlink's`;
  const bound = bands.genusBound === null ? '' : bands.ribbon ? ' · ribbon: every component of the surface is a disk' : ` · genus of the surface ${bands.genusBound}`;
  return (
    <Fact name={`After the ${bands.bands} band${bands.bands === 1 ? '' : 's'}`}>
      <Text style={styles.value} testID="run-bands">{`${verdict} · χ = ${bands.chi}${bound}`}</Text>
    </Fact>
  );
}

/** Start the same computation again (a cancelled or failed run): on the sketch as it is now, or on the same diagram. */
function RunAgain({ run }: { run: RunDetail }) {
  const start = useStartRun();
  const same = { kind: run.kind, ring: run.ring, reduced: run.reduced, sweep: run.sweep ?? undefined, computeS: run.computeS };
  const body = run.sketchId
    ? { ...same, sketchId: run.sketchId, ...(run.diagram.bands && { diagram: run.diagram }) }
    : { ...same, diagram: run.diagram, groupId: run.groupId ?? undefined, label: run.label, source: run.source ?? undefined };
  return (
    <>
      {start.error ? <Banner tone="error">{start.error.message}</Banner> : null}
      <Button variant="secondary" label="Run again" busy={start.isPending} busyLabel="Starting…" onPress={() => start.mutate(body, { onSuccess: (r) => router.push(runPagePath(r.id)) })} />
    </>
  );
}

/** Where the run stands: status, the share of the expected work done, the complex's size, time so far and, once meaningful, what remains. */
function progressLine(run: RunDetail): string {
  const parts = [`${Math.round(run.progress.fraction * 100)}%`];
  if (run.progress.objects && !isFinished(run.status)) parts.push(`complex of ${run.progress.objects} objects`);
  parts.push(isFinished(run.status) ? `took ${duration(run)}` : `${duration(run)} so far`);
  const left = remaining(run);
  if (left) parts.push(`about ${left} left`);
  return parts.join(' · ');
}

/** What was computed, in full: the text it came from, its PD code, the ring, when and by whom. */
function Input({ run }: { run: RunDetail }) {
  const d = run.diagram;
  return (
    <View style={styles.facts}>
      {run.source ? (
        <Fact name="Given as">
          <Text style={styles.code} selectable testID="run-source">{run.source}</Text>
        </Fact>
      ) : null}
      <Fact name={`PD code · ${run.crossings} crossings${d.unknots ? ` and ${d.unknots} unknot${d.unknots === 1 ? '' : 's'}` : ''}`}>
        <Text style={styles.code} selectable testID="run-pd">{pdToText(d.pd)}</Text>
      </Fact>
      {d.bands ? (
        <Fact name={`Bands · ${d.bands.length}, as saddles between edges`}>
          <Text style={styles.code} selectable testID="run-band-list">{d.bands.map(([a, b]) => `[${a}, ${b}]`).join(' ')}</Text>
        </Fact>
      ) : null}
      <Fact name="Computed">
        <Text style={styles.value}>
          {`${run.kind === 'cable-sweep' ? 'Cable sweep' : run.kind === 'bands' ? 'Unlink check of the bands by Khovanov homology' : 'Khovanov homology'} over `}
          <RingName ring={run.ring} />
          {`${run.reduced ? `, reduced at component ${(run.result?.component ?? 0) + 1}` : ''} · started ${runDate(run.createdAt)} by ${run.startedBy.displayName}${run.finishedAt ? ` · ended ${runDate(run.finishedAt)}` : ''}${run.computeS ? ' · with the s-invariant' : ''}${run.reusedFrom ? ' · reused a stored result of the same diagram' : ''}${run.worker ? ` · computed by ${run.worker}` : ''}`}
        </Text>
      </Fact>
    </View>
  );
}

export function RunResult({ run }: { run: RunDetail }) {
  const cancel = useCancelRun(run.id);
  const wide = useIsWide();
  const focused = useRunFocus((f) => f.focused);
  const live = !isFinished(run.status);
  return (
    <>
      <View style={styles.status}>
        <View style={styles.statusLine}>
          <Text style={styles.statusText} testID="run-status">{statusLabel[run.status]}</Text>
          <Text style={styles.muted}>{progressLine(run)}</Text>
        </View>
        <ProgressBar fraction={run.progress.fraction} status={run.status} label="Run progress" />
        {run.error ? <Banner tone={run.status === 'cancelled' ? 'info' : 'error'}>{run.error}</Banner> : null}
        {cancel.error ? <Banner tone="error">{cancel.error.message}</Banner> : null}
        {live ? <Button variant="danger" label="Cancel run" busy={cancel.isPending} busyLabel="Cancelling…" onPress={() => cancel.mutate()} /> : null}
        {run.status === 'cancelled' || run.status === 'failed' ? <RunAgain run={run} /> : null}
      </View>
      <Input run={run} />
      {run.result ? (
        <>
          {run.result.bands ? <BandsFact bands={run.result.bands} /> : null}
          <Section title={`Khovanov homology over ${run.result.ring}${run.result.reduced ? ', reduced' : ''}${run.result.bands ? ' of the diagram after the bands' : ''}`}>
            <KhTable groups={run.result.groups} ring={run.result.ring} label="Khovanov homology" focusable={wide && !focused} />
          </Section>
          <KhSummary result={run.result} />
          {run.result.s ? <SFact s={run.result.s} diagram={run.diagram} /> : null}
          <Section title="Export">
            <Exports record={exportRecord(run, run.diagram, run.result)} base={exportName(run)} />
          </Section>
        </>
      ) : null}
      {run.kind === 'cable-sweep' ? <SweepGrid cells={run.children} /> : null}
    </>
  );
}

const styles = StyleSheet.create({
  status: { gap: space.sm },
  statusLine: { flexDirection: 'row', alignItems: 'baseline', gap: space.md, flexWrap: 'wrap' },
  statusText: { ...type.title, color: colors.ink },
  muted: { ...type.small, color: colors.inkMuted },
  facts: { gap: space.md },
  fact: { gap: space.xs },
  factName: { ...type.caps, color: colors.inkMuted },
  factValue: { flexDirection: 'row', flexWrap: 'wrap' },
  value: { ...type.body, color: colors.ink },
  // In the fact's wrapping row: shrinks to the box so its long line wraps instead of running past it.
  euler: { gap: space.xs, flexShrink: 1, minWidth: 0 },
  exports: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
  code: { fontFamily: fonts.mono, fontSize: 13, color: colors.ink },
});
