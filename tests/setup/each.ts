// Before each test file: full rate-limit buckets (files in the `db` project share one process and
// its module-level limiters). After it: close whatever database it opened (and drop it on a
// PostgreSQL server).
import { afterAll, beforeAll } from 'vitest';
import { closeDb } from '../../db/client';
import { installConnectionPolicy } from '../../server/auth/address';
import { forgetAllBuckets } from '../../server/api/rate-limit';

// As in the server: requests carry the connection's address in PEER_HEADER. In-process tests set
// that header themselves to stand for different clients.
installConnectionPolicy();

beforeAll(() => {
  forgetAllBuckets();
});

afterAll(async () => {
  await closeDb();
});
