// The comparison of the Slate's band surface with another sketch's (components/readout/
// local-compare.ts), computed off the gesture path like the certificate: in a web worker on the
// web, never mid-drag, the last answer kept (marked stale) while the next is computed.
import { useMemo } from 'react';
import type { Sketch } from '@/shared/drawing/sketch';
import { computeCompare } from '@/components/readout/computeCompare';
import type { CompareAnswer } from '@/components/readout/local-compare';
import { useDeviceComputation, type Computed } from './useDeviceComputation';

export function useBandComparison(current: Sketch, other: Sketch | null, paused: boolean): Computed<CompareAnswer> {
  const request = useMemo(() => (other ? { a: current, b: other } : null), [current, other]);
  const r = useDeviceComputation(request, paused, computeCompare);
  return { ...r, stale: r.stale || (request !== null && r.value === undefined && r.error === undefined) };
}
