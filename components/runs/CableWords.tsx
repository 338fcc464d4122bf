// How a cable sweep's (r₊, r₋) is said, on the run form and on the sweep's page alike: typeset,
// because the interface faces have no subscript plus or minus (they came from a fallback font).
import { TeX } from '@/components/ui/Math';

const RPlus = () => <TeX tex="r_+" text="r₊" nowrap />;
const RMinus = () => <TeX tex="r_-" text="r₋" nowrap />;
export const CablePair = () => <TeX tex="(r_+, r_-)" text="(r₊, r₋)" nowrap />;

/** "r₊ parallel and r₋ reversed copies, following the framing." */
export function CableCopies() {
  return <><RPlus /> parallel and <RMinus /> reversed copies, following the framing.</>;
}
