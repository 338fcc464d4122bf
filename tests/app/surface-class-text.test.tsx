// The class's lines in the Readout's bands section: bidegree, coordinates and basis on both
// routes, and the limits of each. The classes are computed (shared/knot/bands), not made up: the
// first ribbon disk of 9_46 on the cube and, with the cube's limit set below its 9 crossings, on
// the local route; a ribbon disk's class is nonzero at q = 1 (Levine and Zemke, arXiv 1903.01546).
import { render, screen } from '@testing-library/react-native';
import { element, SurfaceClassText } from '@/components/readout/SurfaceClassText';
import { surfaceClass } from '@/shared/knot/bands';
import { disks946 } from '@/tests/shared/bands-fixtures';

const limits = 'Cube of resolutions up to 14 crossings; past it the local algorithm, up to 30 crossings and bands on 6 edges.';

test('on the cube: enhanced states as coordinates', () => {
  render(<SurfaceClassText surface={{ value: surfaceClass(disks946.first[0]) }} />);
  screen.getByText('Class over 𝔽₂: nonzero at (h, q) = (0, 1)');
  screen.getByText(/^Coordinates: 1 at [01]{9}/);
  screen.getByText(`Basis: enhanced states of the band drawing's code (resolution per crossing; x-circles by smallest edge label). ${limits}`);
});

test('on the local route: numbered generators of the simplified complex', () => {
  render(<SurfaceClassText surface={{ value: surfaceClass(disks946.first[0], { maxCrossings: 0 }) }} />);
  screen.getByText('Class over 𝔽₂: nonzero at (h, q) = (0, 1)');
  screen.getByText(/^Coordinates: 1 at g[₀-₉]+/);
  screen.getByText(`Basis: generators g₀, g₁, … of the code's complex simplified by the local algorithm (numbered in its order, for this drawing's bands only). ${limits}`);
});

test('basis elements are typeset: resolutions in typewriter, x-labels and generator numbers as subscripts', () => {
  const cube = surfaceClass(disks946.first[0]);
  const local = surfaceClass(disks946.first[0], { maxCrossings: 0 });
  expect(cube.support.length).toBeGreaterThan(0);
  for (const s of cube.support) {
    if ('generator' in s) throw new Error('the cube route names states, not generators');
    const e = element(s);
    expect(e.tex).toContain(`\\mathtt{${s.smoothing}}`);
    if (s.x.length) {
      expect(e.tex).toContain(`x_{${s.x.join(',')}}`);
      expect(e.text).toMatch(/·x[₀-₉,]+$/);
    }
    expect(e.tex).not.toMatch(/x\{/);
  }
  for (const s of local.support) {
    if (!('generator' in s)) throw new Error('the local route names generators');
    expect(element(s)).toEqual({ tex: `g_{${s.generator}}`, text: `g${[...String(s.generator)].map((d) => '₀₁₂₃₄₅₆₇₈₉'[Number(d)]).join('')}` });
  }
});
