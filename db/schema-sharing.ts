/**
 * Tables for working with clients: viewer links, revisions and approvals, comments, invitations, mail.
 * Re-exported by db/schema.ts so one drizzle schema covers them.
 */
export {};
