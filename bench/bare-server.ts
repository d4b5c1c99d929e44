/**
 * The yardstick for the API benchmark: a bare node:http server on PGlite answering the same
 * "read one layout" query with no framework, no auth and no validation. Prints its port.
 */
import http from 'node:http';
import { PGlite } from '@electric-sql/pglite';

async function main() {
  const db = await PGlite.create();
  await db.exec(`create table layouts (id uuid primary key default gen_random_uuid(), name text not null, doc jsonb not null, version int not null default 1)`);
  const doc = JSON.parse(process.env.BENCH_DOC ?? '{}');
  const { rows } = await db.query<{ id: string }>('insert into layouts (name, doc) values ($1, $2) returning id', ['bench', doc]);
  const id = rows[0].id;
  const server = http.createServer(async (req, res) => {
    const result = await db.query('select id, name, doc, version from layouts where id = $1', [id]);
    const body = JSON.stringify(result.rows[0]);
    res.writeHead(200, { 'content-type': 'application/json', 'content-length': Buffer.byteLength(body) });
    res.end(body);
  });
  server.listen(Number(process.env.PORT ?? 3399), '127.0.0.1', () => console.log(`listening ${(server.address() as { port: number }).port}`));
}

main();
