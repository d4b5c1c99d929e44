/**
 * Access-matrix rows for reference uploads, tracing placements and the plan sheet PDF. Each
 * cell that changes something works on its own new layout or upload, so one caller's success
 * never hides another's refusal.
 */
import type { CallOptions } from '../helpers/http';
import type { Row, Fixture } from './access-rows';
import { starterLayout } from '@/lib/layout/templates';
import { pngBytes } from '../uploads/fixtures';

const NOBODY = { anonymous: 401, viewer: 401 } as const;
const READ = { ...NOBODY, foreignClient: 404, otherClient: 404, client: 200, designer: 200, owner: 200, foreignOwner: 404 };
const WRITE = { ...NOBODY, foreignClient: 404, otherClient: 404, client: 403, designer: 200, owner: 200, foreignOwner: 404 };

let seq = 0;
const designerOf = (fx: Fixture) => ({ userId: fx.world.designer.id, studioId: fx.world.designer.studioId, role: 'designer' as const, email: '', name: '' });

async function freshLayout(fx: Fixture): Promise<string> {
  const { createLayout } = await import('@/db/layouts');
  return (await createLayout(designerOf(fx), { name: `Files matrix ${seq++}`, doc: starterLayout('starter-l-lounge')!, clientId: fx.world.client.id })).id;
}

async function freshUpload(fx: Fixture): Promise<string> {
  const { addUpload } = await import('@/db/uploads');
  const layoutId = await freshLayout(fx);
  const bytes = pngBytes(12, 9);
  const upload = await addUpload(designerOf(fx), layoutId, { body: new Blob([new Uint8Array(bytes)]).stream(), fileName: 'rear doors.png', contentType: 'image/png', declaredLength: bytes.length });
  return upload.id;
}

export const FILE_ROWS: Row[] = [
  { route: '/api/layouts/[id]/sheet', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId }, path: `/api/layouts/${fx.world.clientLayoutId}/sheet?paper=a4&scale=25` }), expect: READ },
  // The preliminary layout, chosen: the same rights as the default revision.
  { route: '/api/layouts/[id]/sheet', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId }, path: `/api/layouts/${fx.world.clientLayoutId}/sheet?paper=a4&scale=25&revision=preliminary` }), expect: READ },
  { route: '/api/layouts/[id]/uploads', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId } }), expect: READ },
  {
    route: '/api/layouts/[id]/uploads', method: 'POST',
    request: async (fx): Promise<CallOptions> => {
      const id = await freshLayout(fx);
      return { params: { id }, path: `/api/layouts/${id}/uploads?name=bay.png`, headers: { 'content-type': 'image/png' }, body: new Uint8Array(pngBytes(10, 10)) };
    },
    expect: { ...WRITE, designer: 201, owner: 201 },
  },
  { route: '/api/uploads/[uploadId]', method: 'GET', request: async (fx) => ({ params: { uploadId: await freshUpload(fx) } }), expect: READ },
  { route: '/api/uploads/[uploadId]', method: 'DELETE', request: async (fx) => ({ params: { uploadId: await freshUpload(fx) } }), expect: { ...WRITE, designer: [200, 204], owner: [200, 204] } },
  {
    route: '/api/uploads/[uploadId]/tracing', method: 'PUT',
    request: async (fx) => ({ params: { uploadId: await freshUpload(fx) }, json: { x: 0, y: 0, mmPerPx: 2.5, rotation: 0, opacity: 0.4 } }),
    expect: WRITE,
  },
  { route: '/api/uploads/[uploadId]/tracing', method: 'DELETE', request: async (fx) => ({ params: { uploadId: await freshUpload(fx) } }), expect: WRITE },
];
