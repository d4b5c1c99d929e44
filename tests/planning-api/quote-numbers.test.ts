// Quote references (Q-0001…): the migration that brought them numbers the quotes already sent,
// per studio in the order they were sent, and sets each studio's counter so the next quote
// carries on from there. Run here by undoing its columns on a migrated copy, storing quotes the
// way they were stored before, and applying the migration file's statements as they stand.
import fs from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { sql } from 'drizzle-orm';
import type { Db } from '@/db/client';
import { quoteReference } from '@/db/quotes';
import { useFreshDb } from '../helpers/db';
import { buildWorld, type World } from '../helpers/world';

const DRIZZLE = path.resolve(import.meta.dirname, '../../drizzle');
const MIGRATIONS = fs.readdirSync(DRIZZLE).filter((f) => /^\d{4}_.*\.sql$/.test(f) && /"last_quote_number"/.test(fs.readFileSync(path.join(DRIZZLE, f), 'utf8')));
const MIGRATION = MIGRATIONS[0];

let db: Db;
let w: World;

function rowsOf<T>(res: unknown): T[] {
  return (res as { rows?: T[] }).rows ?? (res as T[]);
}

beforeAll(async () => {
  db = await useFreshDb();
  w = await buildWorld(db);
});

describe('the quote-number migration', () => {
  it('is one migration file that adds the counter', () => {
    expect(MIGRATIONS).toHaveLength(1);
    expect(fs.readFileSync(path.join(DRIZZLE, MIGRATION), 'utf8')).toMatch(/ALTER TABLE "studios" ADD COLUMN "last_quote_number"/);
  });

  it('numbers earlier quotes per studio in the order sent, and the counter carries on', async () => {
    for (const undo of ['DROP INDEX "quotes_studio_number"', 'ALTER TABLE "quotes" DROP COLUMN "number"', 'ALTER TABLE "studios" DROP COLUMN "last_quote_number"']) await db.execute(sql.raw(undo));
    // As stored before: three quotes of the demo studio sent out of id order, one of the other studio.
    const insert = (layoutId: string, studioId: string, status: string, sentAt: string) =>
      db.execute(sql`insert into quotes (layout_id, studio_id, layout_version, status, currency, parts, gross_minor, deposit_pct, deposit_minor, sent_by_name, sent_at)
        values (${layoutId}, ${studioId}, 1, ${status}, 'GBP', '{"lines":[]}'::jsonb, 1000, 20, 200, 'Maren', ${sentAt}::timestamptz)`);
    await insert(w.clientLayoutId, w.owner.studioId, 'superseded', '2026-03-02T10:00:00Z');
    await insert(w.otherLayoutId, w.owner.studioId, 'sent', '2026-03-01T10:00:00Z');
    await insert(w.clientLayoutId, w.owner.studioId, 'sent', '2026-03-05T10:00:00Z');
    await insert(w.foreignLayoutId, w.foreignOwner.studioId, 'sent', '2026-03-03T10:00:00Z');

    const statements = fs.readFileSync(path.resolve(import.meta.dirname, '../../drizzle', MIGRATION!), 'utf8').split('--> statement-breakpoint');
    for (const s of statements) await db.execute(sql.raw(s));

    const rows = rowsOf<{ layout_id: string; studio_id: string; number: number; sent_at: string }>(
      await db.execute(sql`select layout_id, studio_id, number, sent_at::text from quotes order by studio_id, number`),
    );
    const ours = rows.filter((r) => r.studio_id === w.owner.studioId);
    // By sent time: 1 March (other layout) → 1, 2 March → 2, 5 March → 3.
    expect(ours.map((r) => [r.layout_id, r.number])).toEqual([[w.otherLayoutId, 1], [w.clientLayoutId, 2], [w.clientLayoutId, 3]]);
    expect(rows.filter((r) => r.studio_id === w.foreignOwner.studioId).map((r) => r.number)).toEqual([1]);
    const counters = rowsOf<{ id: string; last_quote_number: number }>(await db.execute(sql`select id, last_quote_number from studios`));
    expect(counters.find((c) => c.id === w.owner.studioId)?.last_quote_number).toBe(3);
    expect(counters.find((c) => c.id === w.foreignOwner.studioId)?.last_quote_number).toBe(1);
    // A studio without quotes starts from nothing.
    expect(counters.filter((c) => c.id !== w.owner.studioId && c.id !== w.foreignOwner.studioId).every((c) => c.last_quote_number === 0)).toBe(true);
  });
});

describe('quoteReference', () => {
  it('is Q- and the number in at least four digits', () => {
    expect(quoteReference(7)).toBe('Q-0007');
    expect(quoteReference(1234)).toBe('Q-1234');
    expect(quoteReference(12345)).toBe('Q-12345');
  });
});
