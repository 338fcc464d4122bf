// The Readout's s-invariant, computed off the gesture path (hooks/useDeviceComputation, in a web
// worker on the web: lib/on-device/computeS) for knots up to S_MAX_CROSSINGS crossings.
import { componentCount, type Diagram } from '@/shared/knot/diagram';
import { computeS } from '@/lib/on-device/computeS';
import { S_MAX_CROSSINGS } from '@/lib/on-device/local-s';
import { useDeviceComputation } from './useDeviceComputation';

export type SState =
  | { kind: 'none' }
  /** s is defined for knots here. */
  | { kind: 'link' }
  /** More crossings than the device computes (S_MAX_CROSSINGS). */
  | { kind: 'large'; crossings: number }
  | { kind: 'knot'; s?: number; error?: string; stale: boolean };

export function useSInvariant(diagram: Diagram | null, paused: boolean): SState {
  const knot = diagram && componentCount(diagram) === 1 && diagram.pd.length <= S_MAX_CROSSINGS ? diagram : null;
  const r = useDeviceComputation(knot, paused, computeS);
  if (!diagram) return { kind: 'none' };
  if (componentCount(diagram) !== 1) return { kind: 'link' };
  if (!knot) return { kind: 'large', crossings: diagram.pd.length };
  // Until the first answer for this knot arrives, the value shown is marked as updating.
  return { kind: 'knot', s: r.value, error: r.error, stale: r.stale || (r.value === undefined && r.error === undefined) };
}
