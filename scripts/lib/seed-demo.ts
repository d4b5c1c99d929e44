/**
 * The invented demo workshop, Saltmarsh Van Works: an owner, a designer, two clients and three
 * layouts in different bay classes. Safe to run again: an existing demo studio is left as it is.
 */
import { eq } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { layouts, memberships, priceLists, savedVersions, studios, users } from '../../db/schema';
import { hashPassword } from '../../lib/auth/password';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, DEMO_STUDIO } from '../../lib/demo-accounts';
import { bayTemplate, emptyLayout, starterLayout } from '../../lib/layout/templates';
import { demoPriceList } from './demo-prices';

export async function seedDemo(db: Db): Promise<{ created: boolean }> {
  const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, DEMO_ACCOUNTS[0].email)).limit(1);
  if (existing) return { created: false };

  const hash = await hashPassword(DEMO_PASSWORD);
  await db.transaction(async (tx) => {
    const [studio] = await tx.insert(studios).values({ name: DEMO_STUDIO, units: 'mm' }).returning();
    const ids: Record<string, string> = {};
    for (const a of DEMO_ACCOUNTS) {
      const [u] = await tx.insert(users).values({ email: a.email, name: a.name, passwordHash: hash }).returning();
      ids[a.email] = u.id;
      await tx.insert(memberships).values({ userId: u.id, studioId: studio.id, role: a.role });
    }
    const designer = ids['ivo@saltmarsh.test'];
    const lounge = starterLayout('starter-l-lounge')!;
    const touring = starterLayout('starter-rear-bed')!;
    const stock = emptyLayout('Workshop stock — L4H3 empty bay', bayTemplate('l4h3')!.bay);
    const rows = [
      { name: 'Nair — L2H2 weekender', doc: lounge, clientId: ids['priya@client.test'] },
      { name: 'Adeyemi — L3H2 touring', doc: touring, clientId: ids['tom@client.test'] },
      { name: stock.name, doc: stock, clientId: null },
    ];
    for (const r of rows) {
      const doc = { ...r.doc, name: r.name };
      const [layout] = await tx.insert(layouts).values({
        studioId: studio.id, clientId: r.clientId, name: r.name, doc, createdBy: designer, updatedBy: designer,
      }).returning({ id: layouts.id, version: layouts.version });
      // Its first saved version, as a save through the app would keep it.
      await tx.insert(savedVersions).values({ layoutId: layout.id, version: layout.version, name: r.name, doc, savedBy: designer });
    }
    await tx.insert(priceLists).values({ studioId: studio.id, ...demoPriceList(), updatedBy: ids['maren@saltmarsh.test'] });
  });
  return { created: true };
}
