// Hostile input, half 2 of the write routes (see hostile-input.ts).
import { vi } from 'vitest';
import { fuzzWriteRoutes } from './hostile-input';

// The fuzz is about refusing bad input; new passwords (sign-up, invitations) are hashed at the
// lowest bcrypt cost here, or hashing would be most of its time. The cost the app uses is
// checked in tests/api/accounts.test.ts.
vi.mock('bcryptjs', async (importOriginal) => {
  const bcrypt = ((await importOriginal()) as { default: typeof import('bcryptjs') }).default;
  return { default: { ...bcrypt, hash: (password: string) => bcrypt.hash(password, 4) } };
});

fuzzWriteRoutes(1);
