// The file piscina loads in each pool thread. A worker thread starts without the loaders of
// the main process (Jest's transform, or `node --import tsx`), so this plain ESM shim registers
// tsx's CommonJS hook with the server tsconfig (decorator settings, the @/ alias) and requires
// the TypeScript worker (CommonJS, like the rest of the server: the repository is not
// "type": "module").
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import { register } from 'tsx/cjs/api';

process.env.TSX_TSCONFIG_PATH ??= fileURLToPath(new URL('../tsconfig.json', import.meta.url));
register();

export default createRequire(import.meta.url)('./worker.ts').default;
