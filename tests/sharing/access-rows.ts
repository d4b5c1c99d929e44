/**
 * Rows for the access-control matrix (tests/hardening) covering the sharing routes: for each
 * route and method, a request that succeeds for someone entitled to it (fresh state per call, so
 * one caller's success never turns another's into a conflict) and the status each caller must get.
 * Same shape as tests/hardening/access-rows.ts `Row`; spread `SHARING_ROWS` into its list.
 */
import type { Fixture, Row } from '../hardening/access-rows';
import type { Actor } from '@/db/actor';
import { starterLayout } from '@/lib/layout/templates';

const NOBODY = { anonymous: 401, viewer: 401 } as const;
const READ = { ...NOBODY, foreignClient: 404, otherClient: 404, client: 200, designer: 200, owner: 200, foreignOwner: 404 };
const WORKSHOP = { ...NOBODY, foreignClient: 404, otherClient: 404, client: 403, designer: 200, owner: 200, foreignOwner: 404 };
const PUBLIC = { anonymous: 200, viewer: 200, foreignClient: 200, otherClient: 200, client: 200, designer: 200, owner: 200, foreignOwner: 200 };
/** Studio-level (no layout in the address): each caller acts in their own studio. */
const STAFF = { ...NOBODY, foreignClient: 403, otherClient: 403, client: 403, designer: 200, owner: 200, foreignOwner: 200 };

let seq = 0;
const designerOf = (fx: Fixture): Actor => ({ userId: fx.world.designer.id, studioId: fx.world.designer.studioId, role: 'designer', email: 'ivo@saltmarsh.test', name: 'Ivo Brandt' });

/** A new layout shared with the world's client. */
async function freshLayout(fx: Fixture): Promise<string> {
  const { createLayout } = await import('@/db/layouts');
  const layout = await createLayout(designerOf(fx), { name: `Sharing matrix ${seq++}`, doc: starterLayout('starter-rear-bed')!, clientId: fx.world.client.id });
  return layout.id;
}

async function withRevision(fx: Fixture): Promise<{ id: string; revisionId: string }> {
  const id = await freshLayout(fx);
  const { issueRevision } = await import('@/db/sharing/revisions');
  const rev = await issueRevision(designerOf(fx), id, { note: 'matrix' });
  return { id, revisionId: rev.id };
}

async function viewerToken(fx: Fixture): Promise<string> {
  const { createViewerLink } = await import('@/db/sharing/viewer-links');
  return (await createViewerLink(designerOf(fx), fx.world.clientLayoutId, {})).token;
}

async function invitation(fx: Fixture): Promise<{ id: string; token: string }> {
  const { createInvitation } = await import('@/db/sharing/invitations');
  const issued = await createInvitation(designerOf(fx), { email: `matrix-invite-${seq++}@client.test`, name: 'Matrix Invitee' });
  return { id: issued.invitation.id, token: issued.token };
}

export const SHARING_ROWS: Row[] = [
  { route: '/api/layouts/[id]/revisions', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId } }), expect: READ },
  {
    route: '/api/layouts/[id]/revisions', method: 'POST',
    request: async (fx) => ({ params: { id: await freshLayout(fx) }, json: { note: 'matrix' } }),
    expect: { ...WORKSHOP, designer: 201, owner: 201 },
  },
  {
    route: '/api/layouts/[id]/revisions/[revisionId]', method: 'GET',
    request: async (fx) => ({ params: await withRevision(fx) }),
    expect: READ,
  },
  {
    route: '/api/layouts/[id]/revisions/[revisionId]/decision', method: 'POST',
    request: async (fx) => ({ params: await withRevision(fx), json: { decision: 'approve' } }),
    expect: { ...NOBODY, foreignClient: 404, otherClient: 404, client: 201, designer: 403, owner: 403, foreignOwner: 404 },
  },
  {
    route: '/api/layouts/[id]/revisions/standing', method: 'GET',
    request: async (fx) => ({ params: { id: (await withRevision(fx)).id }, path: '/standing' }),
    expect: READ,
  },
  {
    route: '/api/layouts/[id]/revisions/compare', method: 'GET',
    request: async (fx) => ({ params: { id: (await withRevision(fx)).id }, path: '/compare?from=A&to=current' }),
    expect: READ,
  },
  { route: '/api/layouts/[id]/links', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId } }), expect: WORKSHOP },
  {
    route: '/api/layouts/[id]/links', method: 'POST',
    request: (fx) => ({ params: { id: fx.world.clientLayoutId }, json: { expiresInDays: 7 } }),
    expect: { ...WORKSHOP, designer: 201, owner: 201 },
  },
  {
    route: '/api/layouts/[id]/links/[linkId]', method: 'DELETE',
    request: async (fx) => {
      const { createViewerLink } = await import('@/db/sharing/viewer-links');
      const { link } = await createViewerLink(designerOf(fx), fx.world.clientLayoutId, {});
      return { params: { id: fx.world.clientLayoutId, linkId: link.id } };
    },
    expect: WORKSHOP,
  },
  { route: '/api/layouts/[id]/comments', method: 'GET', request: (fx) => ({ params: { id: fx.world.clientLayoutId } }), expect: READ },
  {
    route: '/api/layouts/[id]/comments', method: 'POST',
    request: (fx) => ({ params: { id: fx.world.clientLayoutId }, json: { arrangement: 'lounge', x: 800, y: 400, body: 'matrix' } }),
    expect: { ...NOBODY, foreignClient: 404, otherClient: 404, client: 201, designer: 201, owner: 201, foreignOwner: 404 },
  },
  {
    route: '/api/layouts/[id]/comments/[commentId]', method: 'PATCH',
    request: async (fx) => {
      const { addComment } = await import('@/db/sharing/comments');
      const { thread } = await addComment(designerOf(fx), fx.world.clientLayoutId, { kind: 'pin', arrangement: 'sleep', x: 500, y: 500, body: 'matrix' });
      return { params: { id: fx.world.clientLayoutId, commentId: thread.id }, json: { settled: true } };
    },
    expect: READ,
  },
  {
    // The designer's own mark-up: the designer (author) and the owner may remove it, the client may not.
    route: '/api/layouts/[id]/comments/[commentId]', method: 'DELETE',
    request: async (fx) => {
      const { addComment } = await import('@/db/sharing/comments');
      const { thread } = await addComment(designerOf(fx), fx.world.clientLayoutId, { kind: 'pin', arrangement: 'sleep', x: 500, y: 500, body: 'matrix' });
      return { params: { id: fx.world.clientLayoutId, commentId: thread.id } };
    },
    expect: { ...NOBODY, foreignClient: 404, otherClient: 404, client: 403, designer: 200, owner: 200, foreignOwner: 404 },
  },
  { route: '/api/invitations', method: 'GET', request: () => ({}), expect: STAFF },
  {
    route: '/api/invitations', method: 'POST',
    request: () => ({ json: { email: `matrix-new-${seq++}@client.test`, name: 'Matrix New' } }),
    expect: { ...STAFF, designer: 201, owner: 201, foreignOwner: 201 },
  },
  {
    route: '/api/invitations/[id]', method: 'DELETE',
    request: async (fx) => ({ params: { id: (await invitation(fx)).id } }),
    expect: { ...STAFF, foreignOwner: 404 },
  },
  {
    route: '/api/invitations/[id]/resend', method: 'POST',
    request: async (fx) => ({ params: { id: (await invitation(fx)).id } }),
    expect: { ...STAFF, foreignOwner: 404 },
  },
  {
    // No session needed: the one-time token is the proof.
    route: '/api/invitations/accept', method: 'POST',
    request: async (fx) => ({ json: { token: (await invitation(fx)).token, password: 'matrix-long-password' } }),
    expect: { anonymous: 201, viewer: 201, foreignClient: 201, otherClient: 201, client: 201, designer: 201, owner: 201, foreignOwner: 201 },
  },
  // Viewer-link routes answer the token, never a session: everyone holding it reads the same.
  { route: '/api/v/[token]', method: 'GET', request: async (fx) => ({ params: { token: await viewerToken(fx) } }), expect: PUBLIC },
  { route: '/api/v/[token]/checks', method: 'GET', request: async (fx) => ({ params: { token: await viewerToken(fx) } }), expect: PUBLIC },
  { route: '/api/v/[token]/version', method: 'GET', request: async (fx) => ({ params: { token: await viewerToken(fx) } }), expect: PUBLIC },
  {
    route: '/outbox/[id]/raw', method: 'GET',
    request: async (fx) => {
      const { storeReceivedMail } = await import('@/db/sharing/outbox');
      const id = await storeReceivedMail({ studioId: fx.world.owner.studioId, messageId: null, mailFrom: 'a@b.test', rcptTo: ['c@d.test'], subject: 'matrix', text: 'matrix', raw: 'Subject: matrix\r\n\r\nmatrix\r\n' });
      return { params: { id } };
    },
    expect: { ...NOBODY, foreignClient: 403, otherClient: 403, client: 403, designer: 403, owner: 200, foreignOwner: 404 },
  },
];
