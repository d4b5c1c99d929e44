// The one access path (db/access.ts): `loadLayoutFor` and the rule behind it, called directly for
// each kind of caller — the studio's owner and designer, the layout's own client, another client of
// the same studio, a member of another studio — and for an archived layout and malformed ids. The
// route-by-route view of the same rule is the access matrix (tests/hardening/access-matrix.test.ts).
import { beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import type { Db } from '@/db/client';
import type { Actor } from '@/db/actor';
import { layouts } from '@/db/schema';
import { loadLayoutFor, requireWorkshop, rightsOver, visibleLayouts } from '@/db/access';
import { isId } from '@/db/ids';
import { listLayouts, setLayoutArchived } from '@/db/layouts';
import { ForbiddenError, NotFoundError } from '@/db/errors';
import { useFreshDb } from '../helpers/db';
import type { SessionUser } from '../helpers/http';
import { buildWorld, type World } from '../helpers/world';

let db: Db;
let w: World;
const actor = (u: SessionUser): Actor => ({ userId: u.id, studioId: u.studioId, role: u.role!, email: '', name: '' });

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
});

describe('loadLayoutFor', () => {
  it('gives the owner and the designer the layout, with the right to change it', async () => {
    for (const who of [w.owner, w.designer]) {
      const got = await loadLayoutFor(actor(who), w.clientLayoutId);
      expect(got).toMatchObject({ id: w.clientLayoutId, studioId: w.owner.studioId, clientId: w.client.id, canEdit: true, isClient: false });
      expect('doc' in got).toBe(false);
      const editable = await loadLayoutFor(actor(who), w.clientLayoutId, { forEdit: true, withDoc: true });
      expect(editable.doc.modules.length).toBeGreaterThan(0);
    }
  });

  it('gives the layout’s own client a view-only copy and refuses them a write with 403', async () => {
    const got = await loadLayoutFor(actor(w.client), w.clientLayoutId, { withDoc: true });
    expect(got).toMatchObject({ canEdit: false, isClient: true });
    expect(got.doc.bay.length).toBeGreaterThan(0);
    await expect(loadLayoutFor(actor(w.client), w.clientLayoutId, { forEdit: 'issue revisions' })).rejects.toThrow(ForbiddenError);
    await expect(loadLayoutFor(actor(w.client), w.clientLayoutId, { forEdit: 'issue revisions' })).rejects.toThrow('Only the workshop can issue revisions.');
  });

  it('answers 404, never 403, to another client of the same studio, for reads and writes alike', async () => {
    await expect(loadLayoutFor(actor(w.otherClient), w.clientLayoutId)).rejects.toThrow(NotFoundError);
    await expect(loadLayoutFor(actor(w.otherClient), w.clientLayoutId, { forEdit: true })).rejects.toThrow(NotFoundError);
    // …while their own layout is theirs to read.
    expect((await loadLayoutFor(actor(w.otherClient), w.otherLayoutId)).isClient).toBe(true);
  });

  it('answers 404 to every member of another studio, its owner included', async () => {
    for (const who of [w.foreignOwner, w.foreignClient]) {
      await expect(loadLayoutFor(actor(who), w.clientLayoutId)).rejects.toThrow(NotFoundError);
      await expect(loadLayoutFor(actor(who), w.clientLayoutId, { forEdit: true, withDoc: true })).rejects.toThrow(NotFoundError);
    }
    // The other way round too: the demo studio's owner cannot reach the foreign studio's layout.
    await expect(loadLayoutFor(actor(w.owner), w.foreignLayoutId)).rejects.toThrow(NotFoundError);
  });

  it('answers 404 for a malformed or unknown id, with the same words as for a hidden layout', async () => {
    for (const id of ['not-a-uuid', '', "1' or '1'='1", `${w.clientLayoutId}x`, '00000000-0000-0000-0000-000000000000']) {
      await expect(loadLayoutFor(actor(w.owner), id)).rejects.toThrow('No such layout.');
    }
  });

  it('keeps the same rights on an archived layout: readable by staff and its client, changeable by staff only', async () => {
    await setLayoutArchived(actor(w.owner), w.otherLayoutId, true);
    const [row] = await db.select({ archivedAt: layouts.archivedAt }).from(layouts).where(eq(layouts.id, w.otherLayoutId));
    expect(row.archivedAt).toBeInstanceOf(Date);
    expect((await loadLayoutFor(actor(w.designer), w.otherLayoutId, { forEdit: true })).archivedAt).toBeInstanceOf(Date);
    expect((await loadLayoutFor(actor(w.otherClient), w.otherLayoutId)).canEdit).toBe(false);
    await expect(loadLayoutFor(actor(w.otherClient), w.otherLayoutId, { forEdit: true })).rejects.toThrow(ForbiddenError);
    await expect(loadLayoutFor(actor(w.client), w.otherLayoutId)).rejects.toThrow(NotFoundError);
    await setLayoutArchived(actor(w.owner), w.otherLayoutId, false);
  });
});

describe('the rule in its other forms', () => {
  it('rightsOver names what hangs off the layout in its 404 and says what was refused in its 403', () => {
    const own = { studioId: w.owner.studioId!, clientId: w.client.id };
    expect(() => rightsOver(actor(w.otherClient), own, { notFound: 'No such file.' })).toThrow('No such file.');
    expect(() => rightsOver(actor(w.client), own, { forEdit: 'delete files' })).toThrow('Only the workshop can delete files.');
    expect(() => rightsOver(actor(w.client), own)).not.toThrow();
    expect(() => rightsOver(actor(w.owner), undefined)).toThrow(NotFoundError);
  });

  it('visibleLayouts lists exactly what loadLayoutFor lets each caller read', async () => {
    const all = await db.select({ id: layouts.id }).from(layouts);
    for (const who of [w.owner, w.designer, w.client, w.otherClient, w.foreignOwner, w.foreignClient]) {
      const listed = (await db.select({ id: layouts.id }).from(layouts).where(visibleLayouts(actor(who)))).map((r) => r.id).sort();
      const readable: string[] = [];
      for (const { id } of all) {
        if (await loadLayoutFor(actor(who), id).then(() => true, () => false)) readable.push(id);
      }
      expect(listed).toEqual(readable.sort());
      expect((await listLayouts(actor(who))).map((l) => l.id).sort()).toEqual(listed);
    }
  });

  it('requireWorkshop lets owners and designers through and refuses a client with 403', () => {
    expect(() => requireWorkshop(actor(w.owner), 'invite clients')).not.toThrow();
    expect(() => requireWorkshop(actor(w.designer), 'invite clients')).not.toThrow();
    expect(() => requireWorkshop(actor(w.client), 'invite clients')).toThrow(ForbiddenError);
  });

  it('isId accepts the database’s ids and nothing else', () => {
    expect(isId(w.clientLayoutId)).toBe(true);
    expect(isId(w.clientLayoutId.toUpperCase())).toBe(true);
    for (const bad of ['', 'A', `${w.clientLayoutId} `, w.clientLayoutId.slice(1), '../etc/passwd']) expect(isId(bad)).toBe(false);
  });
});
