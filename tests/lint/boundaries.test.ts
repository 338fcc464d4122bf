// The import boundaries of eslint.config.mjs hold: probe files that break them are refused by
// `npm run lint`, and the same imports in the folders allowed to make them pass.
import { execFileSync } from 'node:child_process';
import path from 'node:path';

const root = path.resolve(__dirname, '../..');
const eslint = path.join(root, 'node_modules/.bin/eslint');

/** Lints `code` as if it were the file at `file`; returns the rule ids it breaks. */
function lint(file: string, code: string): string[] {
  let out: string;
  try {
    out = execFileSync(eslint, ['--format', 'json', '--stdin', '--stdin-filename', file], { cwd: root, input: code, encoding: 'utf8' });
  } catch (e) {
    out = (e as { stdout: string }).stdout; // eslint exits 1 when it finds problems
  }
  const [result] = JSON.parse(out) as { messages: { ruleId: string | null }[] }[];
  return result.messages.map((m) => m.ruleId ?? 'parse');
}

const probes: [string, string][] = [
  ['shared/knot/probe.ts', "import React from 'react';\nexport const x = React;\n"],
  ['shared/knot/probe.ts', "import { View } from 'react-native';\nexport const x = View;\n"],
  ['shared/knot/probe.ts', "import * as Crypto from 'expo-crypto';\nexport const x = Crypto;\n"],
  ['shared/knot/probe.ts', "import express from 'express';\nexport const x = express;\n"],
  ['shared/knot/probe.ts', "import { DataSource } from 'typeorm';\nexport const x = DataSource;\n"],
  ['shared/knot/probe.ts', "import { readFileSync } from 'node:fs';\nexport const x = readFileSync;\n"],
  ['sync/probe.ts', "import fs from 'fs';\nexport const x = fs;\n"],
  ['sync/probe.ts', "import { api } from '@/lib/api';\nexport const x = api;\n"],
  ['server/probe.ts', "import { api } from '@/lib/api';\nexport const x = api;\n"],
  ['server/runs/probe.ts', "import { Button } from '../../components/ui/Button';\nexport const x = Button;\n"],
  ['components/probe.ts', "import { createApp } from '@/server/app';\nexport const x = createApp;\n"],
  ['lib/probe.ts', "import { createApp } from '../server/app';\nexport const x = createApp;\n"],
];

describe('import boundaries (eslint.config.mjs)', () => {
  it.each(probes)('refuses %s importing %j', (file, code) => {
    expect(lint(file, code)).toContain('no-restricted-imports');
  });

  it('lets each part import what it may', () => {
    expect(lint('shared/knot/probe.ts', "import { z } from 'zod';\nexport const x = z;\n")).toEqual([]);
    expect(lint('server/probe.ts', "import express from 'express';\nimport { orient } from '@/shared/knot/pd';\nexport const x = [express, orient];\n")).toEqual([]);
    expect(lint('components/probe.ts', "import { View } from 'react-native';\nimport { api } from '@/lib/api';\nexport const x = [View, api];\n")).toEqual([]);
  });
});
