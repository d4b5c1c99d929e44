// After each test file: close whatever database it opened (and drop it on a PostgreSQL server).
import { afterAll } from 'vitest';
import { closeDb } from '../../db/client';
import { installConnectionPolicy } from '../../server/auth/address';

// As in the server: requests carry the connection's address in PEER_HEADER. In-process tests set
// that header themselves to stand for different clients.
installConnectionPolicy();

afterAll(async () => {
  await closeDb();
});
