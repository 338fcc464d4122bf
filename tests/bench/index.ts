// npm run bench: every bench module in turn, one line per figure. Add a module with one line.
import { khovanovBench } from './khovanov.bench';

interface Line {
  name: string;
  value: number;
  unit: string;
  goal?: string;
}

const benches: [string, () => Line[] | Promise<Line[]>][] = [
  ['khovanov', khovanovBench],
];

async function main(): Promise<void> {
  for (const [name, bench] of benches) {
    console.log(`# ${name}`);
    for (const l of await bench()) console.log(`${l.name}: ${l.value} ${l.unit}${l.goal ? ` (goal ${l.goal})` : ''}`);
  }
}

void main();
