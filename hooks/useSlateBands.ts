// The Slate's bands, read from the drawing as it stands (not mid-drag): the finger and after
// drawings (shared/drawing/band-read.ts), or why they cannot be read, and the certificate of
// the band presentation, computed off the gesture path (useBandCertificate).
import { useMemo } from 'react';
import { readBands } from '@/shared/drawing/band-read';
import { useSlate } from '@/lib/slate/slate-store';
import { useBandCertificate } from './useBandCertificate';

export function useSlateBands(active: boolean, dragging: boolean) {
  const sketch = useSlate((s) => s.history.present.sketch);
  const drawings = useMemo(() => (active ? readBands(sketch) : null), [active, sketch]);
  const read = drawings && !('reason' in drawings) ? drawings : null;
  const presentation = useMemo(() => (read ? { ...read.presentation, saddles: [...read.presentation.saddles] } : null), [read]);
  const certificate = useBandCertificate(presentation, dragging);
  return { drawings, refused: drawings && 'reason' in drawings ? drawings.reason : null, afterComponents: read?.afterDiagram.components ?? null, presentation, certificate };
}
