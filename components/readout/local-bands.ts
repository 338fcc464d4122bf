// What the Readout's band worker (bands.worker.ts) computes: the certificate of a band
// presentation and, when the bands end at a certified unlink, the surface's class in
// Kh^{0,chi}(K; F2) (shared/knot/bands). The Khovanov check of the unlink runs on the device up to
// BANDS_KH_CROSSINGS crossings of the simplified after-bands diagram; the finger drawing's code
// is taken up to BANDS_MAX_CROSSINGS crossings, and its class up to CLASS_CROSSINGS on the cube, then
// LOCAL_CLASS_CROSSINGS and LOCAL_CLASS_EDGES by the local algorithm.
import { BandError, bandCertificate, surfaceClass, type BandCertificate, type BandPresentation, type SurfaceClass } from '@/shared/knot/bands';

export const BANDS_MAX_CROSSINGS = 80;
export const BANDS_KH_CROSSINGS = 16;

export type BandsRequest = BandPresentation;
/** The class, or why there is none (a size limit); null when the unlink is not certified. */
export type ClassAnswer = { value: SurfaceClass } | { reason: string } | null;
export type BandsAnswer = Omit<BandCertificate, 'after'> & { afterCrossings: number; surface: ClassAnswer };

/** f's value, or the reason of the BandError it threw (a refusal, such as a size limit, checked before any work). */
export function orRefusal<T>(f: () => T): { value: T } | { reason: string } {
  try {
    return { value: f() };
  } catch (e) {
    if (e instanceof BandError) return { reason: e.message };
    throw e;
  }
}

export function certifyBands(p: BandsRequest): BandsAnswer {
  const { after, ...rest } = bandCertificate(p, { maxCrossings: BANDS_KH_CROSSINGS });
  const certified = rest.unlink === 'crossingless' || rest.unlink === 'khovanov';
  return { ...rest, afterCrossings: after.pd.length, surface: certified ? orRefusal(() => surfaceClass(p, { unlinkCrossings: BANDS_KH_CROSSINGS })) : null };
}
