import { hashPassword } from '@keybed/api/password';
import { createDatabase } from '../client';
import { seedDemo } from './index';

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL is required');
const { db, sql } = createDatabase(url, { max: 1 });
try {
  const result = await seedDemo(db, hashPassword);
  console.log(`[keybed] demo data ready: ${result.workshop}, ${result.members} members, ${result.jobs} jobs`);
} finally {
  await sql.end();
}
