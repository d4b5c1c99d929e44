/**
 * Access-matrix rows for managing layouts: rename, duplicate as a variant, the variant family,
 * comparing variants, saved versions and their restore, plan thumbnails. Each cell that changes
 * something works on its own new layout, so one caller's success never hides another's refusal.
 */
import type { Row, Fixture } from './access-rows';
import { starterLayout } from '@/lib/layout/templates';

const NOBODY = { anonymous: 401, viewer: 401 } as const;
const READ = { ...NOBODY, foreignClient: 404, otherClient: 404, client: 200, designer: 200, owner: 200, foreignOwner: 404 };
const WRITE = { ...NOBODY, foreignClient: 404, otherClient: 404, client: 403, designer: 200, owner: 200, foreignOwner: 404 };

let seq = 0;
const designerOf = (fx: Fixture) => ({ userId: fx.world.designer.id, studioId: fx.world.designer.studioId, role: 'designer' as const, email: '', name: '' });

async function freshLayout(fx: Fixture): Promise<string> {
  const { createLayout } = await import('@/db/layouts');
  return (await createLayout(designerOf(fx), { name: `Manage matrix ${seq++}`, doc: starterLayout('starter-l-lounge')!, clientId: fx.world.client.id })).id;
}

/** A layout of the client's with a second save, so version 1 can be restored. */
async function savedTwice(fx: Fixture): Promise<string> {
  const { saveLayout } = await import('@/db/layouts');
  const { loadLayoutFor } = await import('@/db/access');
  const id = await freshLayout(fx);
  const layout = await loadLayoutFor(designerOf(fx), id, { withDoc: true, forEdit: true });
  await saveLayout(designerOf(fx), layout, 1, { doc: { ...layout.doc, modules: layout.doc.modules.slice(1) } });
  return id;
}

export const MANAGE_ROWS: Row[] = [
  {
    route: '/api/layouts/[id]', method: 'PATCH',
    request: async (fx) => ({ params: { id: await freshLayout(fx) }, json: { name: `Renamed ${seq++}` } }),
    expect: WRITE,
  },
  {
    route: '/api/layouts/[id]/variants', method: 'POST',
    request: async (fx) => ({ params: { id: await freshLayout(fx) }, json: {} }),
    expect: { ...WRITE, designer: 201, owner: 201 },
  },
  { route: '/api/layouts/[id]/variants', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId } }), expect: READ },
  {
    route: '/api/layouts/[id]/compare', method: 'GET',
    request: async (fx) => {
      const { duplicateAsVariant } = await import('@/db/layouts');
      const variant = await duplicateAsVariant(designerOf(fx), fx.world.clientLayoutId);
      return { params: { id: fx.world.clientLayoutId }, path: `/api/layouts/${fx.world.clientLayoutId}/compare?with=${variant.id}` };
    },
    expect: READ,
  },
  { route: '/api/layouts/[id]/versions', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId } }), expect: READ },
  {
    route: '/api/layouts/[id]/versions/[version]/restore', method: 'POST',
    request: async (fx) => ({ params: { id: await savedTwice(fx), version: '1' } }),
    expect: WRITE,
  },
  { route: '/api/layouts/[id]/thumbnail', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId } }), expect: READ },
];
