// A run's ring (Z, Q, F5 in the API) typeset as the result tables write it, so the line that says
// what was computed and the table below it name the ring alike (ℤ, ℚ, 𝔽₅).
import { groupText } from '@/shared/khovanov/format';
import { subscript } from '@/shared/text/integers';
import { TeX } from '@/components/ui/Math';

/** ℤ, ℚ, 𝔽₅: what screen readers and the native build read in the TeX's place. */
export const ringUnicode = (ring: string): string =>
  ring === 'Z' ? 'ℤ' : ring === 'Q' ? 'ℚ' : '𝔽' + subscript(ring.slice(1));

export function RingName({ ring }: { ring: string }) {
  return <TeX tex={groupText({ i: 0, j: 0, free: 1, torsion: [] }, ring, 'tex')} text={ringUnicode(ring)} nowrap />;
}
