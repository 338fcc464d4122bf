// What the Readout's band worker (bands.worker.ts) computes: the certificate of a band
// presentation (shared/knot/bands). The Khovanov check of the unlink runs on the device up to
// BANDS_KH_CROSSINGS crossings of the simplified after-bands diagram; the finger drawing's code
// is taken up to BANDS_MAX_CROSSINGS crossings.
import { bandCertificate, type BandCertificate, type BandPresentation } from '@/shared/knot/bands';

export const BANDS_MAX_CROSSINGS = 80;
export const BANDS_KH_CROSSINGS = 16;

export type BandsRequest = BandPresentation;
export type BandsAnswer = Omit<BandCertificate, 'after'> & { afterCrossings: number };

export function certifyBands(p: BandsRequest): BandsAnswer {
  const { after, ...rest } = bandCertificate(p, { maxCrossings: BANDS_KH_CROSSINGS });
  return { ...rest, afterCrossings: after.pd.length };
}
