// The Readout: the instant invariants of the diagram on the Slate, each marked while it is
// being recomputed, with what to do when there is nothing to compute yet; the s-invariant
// (hooks/useSInvariant, in a web worker) with the slice-genus bounds from s and the signature.
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { Marker } from '@/shared/drawing/crossings';
import type { ReadoutState } from '@/hooks/useReadout';
import type { SState } from '@/hooks/useSInvariant';
import { sliceBoundsText, sliceGenusBounds } from '@/shared/rasmussen';
import { S_MAX_CROSSINGS } from '@/lib/on-device/local-s';
import type { ReadoutKey } from '@/lib/slate/readout';
import { HOMFLY_DEVICE_LIMIT } from '@/lib/slate/readout';
import { framedText } from '@/lib/slate/framed-text';
import { minus, signed } from '@/shared/text/integers';
import { TeX } from '@/components/ui/Math';
import { ConventionsSheet, chiralityNote } from './Conventions';
import { NameText } from './NameText';
import { colors, fonts, radius, space, type } from '@/constants/theme';

type Props = {
  state: ReadoutState;
  s: SState;
  /** Why there is no diagram yet (null: there is one). */
  empty: null | 'nothing' | 'open' | 'markers';
  markers: readonly Marker[];
  openStrands: number;
  /** The number shown for each diagram component (the Slate numbers them in drawing order); default 1, 2, ... */
  numbers?: readonly number[];
};

function Line({ label, testID, stale, error, has, children }: { label: string; testID: string; stale: boolean; error?: string; has: boolean; children: React.ReactNode }) {
  return (
    <View style={styles.row} aria-busy={stale} testID={testID}>
      <View style={styles.labelCol}>
        <Text style={styles.label}>{label}</Text>
        {stale ? <Text style={styles.updating} accessibilityLabel={`${label} updating`}>updating…</Text> : null}
      </View>
      <View style={[styles.value, stale && styles.staleValue]}>
        {error ? <Text style={styles.error}>Could not compute: {error}</Text> : has ? children : <Text style={styles.pending}>…</Text>}
      </View>
    </View>
  );
}

function Row({ label, k, state, children }: { label: string; k: ReadoutKey; state: ReadoutState; children: React.ReactNode }) {
  return (
    <Line label={label} testID={`readout-${k}`} stale={state.stale.has(k)} error={state.errors[k]} has={state.values[k] !== undefined}>
      {children}
    </Line>
  );
}

/** "Conventions": the sheet saying which signs and chiralities the values follow. */
function ConventionsLink() {
  const [open, setOpen] = useState(false);
  return (
    <>
      <Pressable role="button" accessibilityLabel="Conventions" onPress={() => setOpen(true)} style={styles.conventions}>
        <Text style={styles.conventionsText}>Conventions ›</Text>
      </Pressable>
      <ConventionsSheet visible={open} onClose={() => setOpen(false)} />
    </>
  );
}

/** s (from its worker) with the two slice-genus bounds; for a link or a large diagram, why not. */
function SRow({ s, signature }: { s: SState; signature?: number }) {
  if (s.kind === 'none') return null;
  const label = 'Rasmussen s (over Q)';
  if (s.kind !== 'knot') {
    return (
      <Line label={label} testID="readout-s" stale={false} has>
        <Text style={styles.note}>
          {s.kind === 'link'
            ? 's is defined for knots here.'
            : `Computed on the device up to ${S_MAX_CROSSINGS} crossings (this has ${s.crossings}); a Khovanov run can also compute s.`}
        </Text>
      </Line>
    );
  }
  const b = s.s !== undefined && signature !== undefined ? sliceGenusBounds(s.s, signature) : null;
  return (
    <Line label={label} testID="readout-s" stale={s.stale} error={s.error} has={s.s !== undefined}>
      <View>
        <Text style={styles.num}>s = {minus(s.s ?? 0)}</Text>
        {b ? (
          <Text style={styles.note} testID="readout-slice-bounds">
            {sliceBoundsText(b)}
          </Text>
        ) : null}
      </View>
    </Line>
  );
}

export function Readout({ state, s, empty, markers, openStrands, numbers }: Props) {
  const v = state.values;
  const framed = framedText(v.framings ?? [], v.linking ?? [], numbers);
  if (empty) {
    return (
      <View style={styles.box} testID="readout">
        <Text style={styles.kicker}>Readout</Text>
        {empty === 'markers' ? (
          <View style={styles.notice} role="alert">
            <Text style={styles.noticeTitle}>{markers.length === 1 ? 'One spot needs attention' : `${markers.length} spots need attention`}</Text>
            {[...new Set(markers.map((m) => m.message))].map((m) => (
              <Text key={m} style={styles.noticeBody}>{m}</Text>
            ))}
            <Text style={styles.noticeBody}>The invariants return when the drawing is clean.</Text>
          </View>
        ) : (
          <Text style={styles.hint}>
            {empty === 'open'
              ? 'Close the strand: end it near where it started. Unfinished strands are not counted.'
              : 'Draw a closed strand on the Slate, or paste a code. The invariants appear here as you draw.'}
          </Text>
        )}
      </View>
    );
  }
  const name = v.name;
  const chirality = name && v.signature !== undefined ? chiralityNote(name.name, name.mirror, v.signature) : null;
  return (
    <View style={styles.box} testID="readout">
      <Text style={styles.kicker}>Readout</Text>
      <View style={[styles.headline, state.stale.has('crossings') && styles.staleValue]} aria-busy={state.stale.has('crossings')} testID="readout-headline">
        <Text style={styles.big} testID="readout-crossings-count">
          {v.crossings ?? '…'} {v.crossings === 1 ? 'crossing' : 'crossings'}
        </Text>
        <Text style={styles.sub}>
          {v.components ?? '…'} {v.components === 1 ? 'component' : 'components'} · writhe {v.writhe !== undefined ? signed(v.writhe) : '…'}
          {openStrands ? ` · ${openStrands} unfinished` : ''}
        </Text>
        <View aria-busy={state.stale.has('name')} testID="readout-name" style={state.stale.has('name') && styles.staleValue}>
          {name ? (
            <NameText style={styles.nameText} text={name.text} />
          ) : v.name === null ? (
            <Text style={styles.nameText}>{v.components === 1 ? 'Not among the knots up to 8 crossings' : 'A link: no name guess'}</Text>
          ) : null}
        </View>
        {chirality ? <NameText style={styles.nameText} testID="readout-chirality" text={chirality} /> : null}
        <ConventionsLink />
      </View>

      <Row label="Jones polynomial" k="jones" state={state}>
        {v.jones ? <TeX tex={`V(t) = ${v.jones.format('t', 'latex')}`} text={`V(t) = ${v.jones.format('t', 'unicode')}`} /> : null}
      </Row>
      <Row label="Kauffman bracket" k="bracket" state={state}>
        {v.bracket ? <TeX tex={`\\langle D\\rangle = ${v.bracket.format('A', 'latex')}`} text={`⟨D⟩ = ${v.bracket.format('A', 'unicode')}`} /> : null}
      </Row>
      <Row label="Alexander polynomial" k="alexander" state={state}>
        {v.alexander ? (
          <View>
            <TeX tex={`\\Delta(t) = ${v.alexander.polynomial.format('t', 'latex')}`} text={`Δ(t) = ${v.alexander.polynomial.format('t', 'unicode')}`} />
            {v.alexander.conwaySign ? null : <Text style={styles.note}>Sign by our convention (first Conway coefficient is 0).</Text>}
          </View>
        ) : null}
      </Row>
      <Row label="HOMFLY-PT polynomial" k="homfly" state={state}>
        {v.homfly ? (
          <TeX tex={`P(v,z) = ${v.homfly.format('latex')}`} text={`P(v,z) = ${v.homfly.format('unicode')}`} />
        ) : (
          <Text style={styles.note}>Computed here up to {HOMFLY_DEVICE_LIMIT} crossings; the command line computes it at any size.</Text>
        )}
      </Row>
      <Row label="Determinant" k="determinant" state={state}>
        <Text style={styles.num}>{v.determinant?.toString()}</Text>
      </Row>
      <Row label="Signature" k="signature" state={state}>
        <Text style={styles.num}>{v.signature !== undefined ? signed(v.signature) : ''}</Text>
      </Row>
      <SRow s={s} signature={v.signature} />
      <Row label="Framings" k="framings" state={state}>
        <Text style={styles.num}>{framed.framings}</Text>
      </Row>
      {framed.linking ? (
        <Row label="Linking numbers" k="linking" state={state}>
          <Text style={styles.num}>{framed.linking}</Text>
        </Row>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  kicker: { ...type.caps, color: colors.accent },
  headline: { gap: 2, paddingBottom: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line },
  big: { ...type.display, color: colors.ink },
  sub: { ...type.small, color: colors.inkMuted },
  nameText: { ...type.small, color: colors.inkMuted, marginTop: space.xs },
  conventions: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start' },
  conventionsText: { ...type.label, color: colors.accent },
  row: { gap: 2 },
  labelCol: { flexDirection: 'row', alignItems: 'baseline', justifyContent: 'space-between' },
  label: { ...type.label, color: colors.inkMuted },
  updating: { ...type.label, fontSize: 12, color: colors.accent },
  value: { minHeight: 24, justifyContent: 'center' },
  staleValue: { opacity: 0.4 },
  num: { fontFamily: fonts.mono, fontSize: 15, lineHeight: 22, color: colors.ink },
  pending: { ...type.body, color: colors.inkFaint },
  error: { ...type.small, color: colors.danger },
  note: { ...type.small, fontSize: 12, color: colors.inkFaint },
  hint: { ...type.body, color: colors.inkMuted },
  notice: { backgroundColor: colors.dangerSoft, borderRadius: radius.md, padding: space.md, gap: space.xs },
  noticeTitle: { ...type.heading, color: colors.danger },
  noticeBody: { ...type.small, color: colors.ink },
});
