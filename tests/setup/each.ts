// After each test file: close whatever database it opened (and drop it on a PostgreSQL server).
import { afterAll } from 'vitest';
import { closeDb } from '../../db/client';

afterAll(async () => {
  await closeDb();
});
