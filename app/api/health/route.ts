/**
 * Readiness for a load balancer or a start-up probe: 200 when this instance answers and its
 * database takes a query, 503 when the database does not. Says nothing about any studio.
 */
import { sql } from 'drizzle-orm';
import { getDb } from '@/db/client';
import { json, problem } from '@/server/api/respond';

export const dynamic = 'force-dynamic';

export async function GET() {
  try {
    const db = await getDb();
    await db.execute(sql`select 1`);
    return json({ ok: true }, { headers: { 'cache-control': 'no-store' } });
  } catch {
    return problem(503, 'The database is not answering.');
  }
}
