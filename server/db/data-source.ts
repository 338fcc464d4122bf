// The DataSource the TypeORM CLI uses (npm run migration:generate / migration:run).
// The server itself opens its database through connect.ts.
import { createDataSource } from './connect';

export default createDataSource(process.env.DATABASE_PATH ?? 'data/overstrand.sqlite');
