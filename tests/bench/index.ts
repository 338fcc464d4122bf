// npm run bench: every bench module in turn, one line per figure. Add a module with one line.
import { jonesBench } from './jones.bench';
import { cableBench, khovanovBench } from './khovanov.bench';
import type { Line } from './timing';

const benches: [string, () => Line[] | Promise<Line[]>][] = [
  ['jones', jonesBench],
  ['khovanov', () => [...khovanovBench(), ...cableBench()]],
  ['drawing', () => import('./drawing.bench').then((m) => m.drawingBench())],
  ['readout', () => import('./readout.bench').then((m) => m.readoutBench())],
  ['sync', () => import('./sync.bench').then((m) => m.syncBench())],
  ['sinv', () => import('./sinv.bench').then((m) => m.sinvBench())],
  ['homfly', () => import('./homfly.bench').then((m) => m.homflyBench())],
  ['bands', () => import('./bands.bench').then((m) => m.bandsBench())],
  ['freeze', () => import('./freeze.bench').then((m) => m.freezeBench())],
  ['queue', () => import('./queue.bench').then((m) => m.queueBench())],
  ['pictures', () => import('./pictures.bench').then((m) => m.picturesBench())],
];

async function main(): Promise<void> {
  // `npm run bench -- jones` runs only the benches named.
  const wanted = process.argv.slice(2);
  for (const [name, bench] of benches) {
    if (wanted.length > 0 && !wanted.includes(name)) continue;
    console.log(`# ${name}`);
    for (const l of await bench()) console.log(`${l.name}: ${l.value} ${l.unit}${l.goal ? ` (goal ${l.goal})` : ''}`);
  }
}

void main();
