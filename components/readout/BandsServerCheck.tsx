// "Check on the server": a bands run (POST /api/runs, kind "bands") for a band presentation the
// device could not certify, too large for it or past its Khovanov limit; the server simplifies
// the diagram after the bands and computes its Khovanov homology at any size, and the run page
// shows the certificate. The run goes on the sketch when the server has it (its group sees it),
// else on the code alone, private (a sketch not synced yet). Offline or signed out: why not.
import { create } from 'zustand';
import { useStore } from 'zustand';
import { StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import { isApiError } from '@/lib/api';
import { syncStatus } from '@/lib/store/device';
import { runPagePath, type StartRunRequest } from '@/shared/api/runs';
import type { BandPresentation } from '@/shared/knot/bands';
import { useRun, useStartRun } from '@/hooks/queries/useRuns';
import { useSlate } from '@/lib/slate/slate-store';
import { useSession } from '@/hooks/useSession';
import { Button } from '@/components/ui/Button';
import { statusLabel } from '@/lib/run-format';
import { colors, space, type } from '@/constants/theme';

/** The bands a run was started for, so its link stays while the Readout remounts and goes when the bands change. */
const useStarted = create<{ key: string | null; runId: string | null; started(key: string, runId: string): void }>((set) => ({
  key: null,
  runId: null,
  started: (key, runId) => set({ key, runId }),
}));

const keyOf = (sketchId: string, p: BandPresentation) => JSON.stringify([sketchId, p.pd, p.unknots, p.saddles]);

function request(p: BandPresentation, sketchId?: string): StartRunRequest {
  const diagram = { pd: p.pd.map((x) => [...x] as [number, number, number, number]), unknots: p.unknots, bands: p.saddles.map((s) => [s.a, s.b] as [number, number]) };
  return { kind: 'bands', diagram, ...(sketchId ? { sketchId } : { label: `Bands: ${p.saddles.length} on a ${p.pd.length}-crossing drawing` }) };
}

function StartedRun({ id }: { id: string }) {
  const run = useRun(id).data;
  return (
    <Text style={styles.line} testID="readout-bands-run">
      {`Bands run ${run ? statusLabel[run.status].toLowerCase() : 'started'}: `}
      <Link href={runPagePath(id)} style={styles.link}>open the run page</Link>
    </Text>
  );
}

export function BandsServerCheck({ presentation }: { presentation: BandPresentation }) {
  const sketchId = useSlate((s) => s.sketchId) ?? '';
  const signedIn = useSession((s) => s.status === 'signedIn');
  const online = useStore(syncStatus, (s) => s.online);
  const start = useStartRun();
  const key = keyOf(sketchId, presentation);
  const runId = useStarted((s) => (s.key === key ? s.runId : null));
  if (!signedIn) return <Text style={styles.note}>Sign in to check it on the server.</Text>;
  if (runId) return <StartedRun id={runId} />;
  if (!online) return <Text style={styles.note}>Offline: checking on the server needs the network.</Text>;
  const onSuccess = (run: { id: string }) => useStarted.getState().started(key, run.id);
  const check = () =>
    start.mutate(request(presentation, sketchId), {
      onSuccess,
      // Not synced to the server yet: the run goes on the code as drawn.
      onError: (err) => isApiError(err, 'not_found') && start.mutate(request(presentation), { onSuccess }),
    });
  return (
    <View style={styles.box}>
      <Button variant="secondary" label="Check on the server" busy={start.isPending} busyLabel="Starting the run…" onPress={check} />
      {start.error && !isApiError(start.error, 'not_found') ? <Text style={styles.error} role="alert">{start.error.message}</Text> : null}
      <Text style={styles.note}>A bands run: the server checks the diagram after the bands by Khovanov homology at any size.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, marginTop: space.xs, alignItems: 'flex-start' },
  line: { ...type.small, color: colors.ink, marginTop: space.xs },
  link: { ...type.label, fontSize: 14, color: colors.accent, textDecorationLine: 'underline' },
  note: { ...type.small, fontSize: 12, color: colors.inkFaint },
  error: { ...type.small, color: colors.danger },
});
