/**
 * A small world for API tests: the demo studio (owner, designer, two clients, three layouts)
 * plus a second studio with its own owner and client, all as session users.
 */
import { eq } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { layouts, memberships, studios, users } from '../../db/schema';
import { seedDemo } from '../../scripts/lib/seed-demo';
import { DUMMY_HASH } from '../../lib/auth/password';
import { starterLayout } from '../../lib/layout/templates';
import type { SessionUser } from './http';

export interface World {
  owner: SessionUser;
  designer: SessionUser;
  client: SessionUser;
  otherClient: SessionUser;
  foreignOwner: SessionUser;
  foreignClient: SessionUser;
  /** Layout shared with `client`. */
  clientLayoutId: string;
  /** Layout shared with `otherClient`. */
  otherLayoutId: string;
  foreignLayoutId: string;
}

export async function buildWorld(db: Db): Promise<World> {
  await seedDemo(db);
  const byEmail = async (email: string) => {
    const [u] = await db.select({ id: users.id, studioId: memberships.studioId, role: memberships.role }).from(users)
      .innerJoin(memberships, eq(memberships.userId, users.id)).where(eq(users.email, email));
    return { id: u.id, studioId: u.studioId, role: u.role } as SessionUser;
  };
  const owner = await byEmail('maren@saltmarsh.test');
  const designer = await byEmail('ivo@saltmarsh.test');
  const client = await byEmail('priya@client.test');
  const otherClient = await byEmail('tom@client.test');

  const [studio] = await db.insert(studios).values({ name: 'Harbour Campers' }).returning();
  const [fo] = await db.insert(users).values({ email: 'olu@harbour.test', name: 'Olu Harbour', passwordHash: DUMMY_HASH }).returning();
  const [fc] = await db.insert(users).values({ email: 'kit@harbour.test', name: 'Kit Client', passwordHash: DUMMY_HASH }).returning();
  await db.insert(memberships).values([
    { userId: fo.id, studioId: studio.id, role: 'owner' },
    { userId: fc.id, studioId: studio.id, role: 'client' },
  ]);
  const [foreign] = await db.insert(layouts).values({ studioId: studio.id, clientId: fc.id, name: 'Harbour secret plan', doc: { ...starterLayout('starter-rear-bed')!, name: 'Harbour secret plan' } }).returning();

  const rows = await db.select({ id: layouts.id, clientId: layouts.clientId }).from(layouts).where(eq(layouts.studioId, owner.studioId));
  return {
    owner, designer, client, otherClient,
    foreignOwner: { id: fo.id, studioId: studio.id, role: 'owner' },
    foreignClient: { id: fc.id, studioId: studio.id, role: 'client' },
    clientLayoutId: rows.find((r) => r.clientId === client.id)!.id,
    otherLayoutId: rows.find((r) => r.clientId === otherClient.id)!.id,
    foreignLayoutId: foreign.id,
  };
}
