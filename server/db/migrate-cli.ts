// `npm run migrate` against DATABASE_URL (npm start and npm test migrate on their own).
import { createDb, createPool } from './database';
import { migrateToLatest } from './migrate';

const url = process.env.DATABASE_URL;
if (!url) {
  console.error('DATABASE_URL is not set');
  process.exit(2);
}
const db = createDb(createPool(url));
const applied = await migrateToLatest(db);
console.log(applied.length ? `applied: ${applied.join(', ')}` : 'schema is up to date');
await db.destroy();
