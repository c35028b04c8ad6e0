// Benchmark (not a test): the manager's all-visits table and CSV export at 100,000 visits.
// `npx tsx scripts/bench-visit-table.ts [visits]` starts a throwaway PostgreSQL cluster, migrates a
// database, fills it with made-up rows, then times the table query, the count and the export, and
// prints each plan's index use. The cluster and its files are removed at the end.
import fs from 'node:fs';
import { performance } from 'node:perf_hooks';
import pg from 'pg';
import { createSequelize } from '../server/db/sequelize';
import { initModels } from '../server/db/models';
import { migrate } from '../server/db/umzug';
import { visitCsvChunks } from '../server/modules/manager/visit-export';
import { visitBatchStatement, visitBatches, visitCountStatement, visitPageStatement } from '../server/modules/manager/visit-table.repository';
import { visitTable } from '../server/modules/manager/manager.service';
import { visitTableFilterSchema, visitTableQuerySchema } from '../shared/schemas/visit-table';
import { appUrl, ensureDatabase } from './lib/database';
import { say } from './lib/log';
import { startCluster } from './lib/pg-cluster';

const VISITS = Number(process.argv[2] ?? 100_000);
const DB = 'crankwise_bench';
const cluster = await startCluster(`.data/bench-pg/run-${process.pid}`, { preferredPort: 54340, throwaway: true });
const cleanUp = () => {
  cluster.stop();
  fs.rmSync(cluster.dir, { recursive: true, force: true });
};

async function fill(adminUrl: string) {
  const c = new pg.Client({ connectionString: adminUrl });
  await c.connect();
  // Bulk load as superuser with triggers off: the status and closed-record triggers guard the app's
  // writes, not a benchmark's made-up history. Every name below is invented.
  await c.query(`SET session_replication_role = replica`);
  await c.query(`
    INSERT INTO users (email, name, role, password_hash)
      SELECT 'bench-tech-' || i || '@bench.example', 'Bench Technician ' || i, 'technician', 'x' FROM generate_series(1, 12) i;
    INSERT INTO customers (name) SELECT 'Bench Stamping Co ' || i || ' (invented)' FROM generate_series(1, 40) i;
    INSERT INTO sites (customer_id, name) SELECT 1 + (i % 40), 'Bench Plant ' || i FROM generate_series(1, 120) i;
    INSERT INTO presses (site_id, asset_tag, model, tonnage)
      SELECT 1 + (i % 120), 'BP-' || lpad(i::text, 4, '0'), 'Invented SP-' || (100 + (i % 9) * 50), 100 + (i % 9) * 50 FROM generate_series(1, 600) i;
  `);
  await c.query(
    `INSERT INTO visits (press_id, technician_id, status, fault_displayed, started_at, closed_at, cause_category, actions_taken, labour_minutes, travel_minutes)
     SELECT 1 + (random() * 599)::int,
            1 + (random() * 11)::int,
            s.status,
            (ARRAY['Crank angle sensor fault', 'Resolver signal lost', 'Angle jumps at bottom', 'Counts drift after warm-up', 'Brake monitor fault'])[1 + (i % 5)] || ' ' || (i % 97),
            t.started,
            CASE WHEN s.status IN ('closed', 'approved', 'returned') THEN t.started + (20 + (random() * 300)::int) * interval '1 minute' END,
            CASE WHEN s.status IN ('closed', 'approved', 'returned')
                 THEN (ARRAY['configuration', 'wiring', 'firmware', 'sensor', 'cable', 'board', 'none_found'])[1 + (i % 7)] END,
            CASE WHEN s.status IN ('closed', 'approved', 'returned') THEN 'Re-terminated shield; replaced part ' || (i % 53) END,
            (random() * 240)::int, (random() * 120)::int
     FROM generate_series(1, $1) i
     -- i * 0 ties the draw to the row: an uncorrelated LATERAL with random() runs once for all rows.
     CROSS JOIN LATERAL (SELECT now() - (random() * 1095 + i * 0) * interval '1 day' AS started) t
     CROSS JOIN LATERAL (SELECT CASE WHEN i % 50 = 0 THEN 'in_progress' WHEN i % 40 = 0 THEN 'closed' WHEN i % 97 = 0 THEN 'returned' ELSE 'approved' END AS status) s`,
    [VISITS],
  );
  // Six readings on a third of the visits, so the per-row reading counts have work to do.
  await c.query(`
    INSERT INTO readings (id, visit_id, step_id, quantity, circuit, position, entry, value_si, verdict, reason, judgement, created_by)
      SELECT gen_random_uuid(), v.id, 'resistance-control-end', 'resistance', c.circuit, p.position, '50', 50,
             (ARRAY['in_band', 'in_band', 'in_band', 'near_edge', 'out_of_band', 'open'])[1 + ((v.id + length(c.circuit)) % 6)], 'bench', '{}'::jsonb, v.technician_id
      FROM visits v
      CROSS JOIN (VALUES ('rotor'), ('stator_1'), ('stator_2')) c(circuit)
      CROSS JOIN (VALUES ('control_end'), ('sensor_end')) p(position)
      WHERE v.id % 3 = 0;
    ANALYZE;
  `);
  await c.end();
}

async function time<T>(runs: number, work: () => Promise<T>): Promise<{ median: number; last: T }> {
  const ms: number[] = [];
  let last!: T;
  for (let i = 0; i < runs; i += 1) {
    const t0 = performance.now();
    last = await work();
    ms.push(performance.now() - t0);
  }
  ms.sort((a, b) => a - b);
  return { median: ms[Math.floor(ms.length / 2)]!, last };
}

/** Index names in the plan, and whether any node reads the whole visits table. */
async function planSummary(client: pg.Client, sql: string, values: unknown[]) {
  const { rows } = await client.query(`EXPLAIN (ANALYZE, FORMAT TEXT) ${sql}`, values);
  const text = rows.map((r: Record<string, string>) => r['QUERY PLAN']).join('\n');
  const indexes = [...new Set([...text.matchAll(/(?:Index(?: Only)? Scan(?: Backward)?|Bitmap Index Scan) (?:using |on )(\w+)/g)].map((m) => m[1]))];
  const seqVisits = /Seq Scan on visits/.test(text);
  const execution = /Execution Time: ([\d.]+) ms/.exec(text)?.[1];
  return { indexes, seqVisits, execution, text };
}

const SCENARIOS: Array<[string, Record<string, string>]> = [
  ['default: newest first, page 1', {}],
  ['review queue: closed, oldest closed first', { status: 'closed', sort: 'closedAt', dir: 'asc' }],
  ['technician filter, newest first', { technicianId: '3' }],
  ['customer filter, sorted by press', { customerId: '7', sort: 'press', dir: 'asc' }],
  ['cause + date range (90 days)', { cause: 'sensor', from: new Date(Date.now() - 90 * 864e5).toISOString().slice(0, 10), to: new Date().toISOString().slice(0, 10) }],
  ['free text "drift" (fault text, trigram)', { q: 'drift' }],
  ['free text "BP-0042" (asset tag → press index)', { q: 'BP-0042' }],
  ['sort by customer name, page 200', { sort: 'customer', dir: 'asc', page: '200' }],
];

try {
  const adminUrl = cluster.adminUrl();
  await ensureDatabase(adminUrl, DB);
  const sequelize = createSequelize(appUrl(adminUrl, DB));
  await migrate(sequelize);
  initModels(sequelize);
  const trgm = await sequelize.query(`SELECT 1 FROM pg_extension WHERE extname = 'pg_trgm'`);
  say(`pg_trgm installed by the migration: ${(trgm[0] as unknown[]).length === 1 ? 'yes' : 'no'}`);
  const t0 = performance.now();
  await fill(cluster.adminUrl(DB));
  say(`inserted ${VISITS.toLocaleString()} visits in ${((performance.now() - t0) / 1000).toFixed(1)} s`);

  const explain = new pg.Client({ connectionString: appUrl(adminUrl, DB) });
  await explain.connect();
  console.log('\nscenario | page+count median ms (5 runs) | rows total | page plan: indexes, seq scan on visits? | count plan');
  for (const [name, raw] of SCENARIOS.filter(([n]) => !process.env.BENCH_ONLY || n.includes(process.env.BENCH_ONLY))) {
    const q = visitTableQuerySchema.parse({ tz: 'UTC', ...raw });
    const { median, last } = await time(5, () => visitTable(q));
    const page = visitPageStatement(q);
    const count = visitCountStatement(q);
    const pagePlan = await planSummary(explain, page.sql, page.values);
    const countPlan = await planSummary(explain, count.sql, count.values);
    console.log(
      `${name} | ${median.toFixed(1)} | ${last.total.toLocaleString()} | ${pagePlan.indexes.join(', ') || '—'}; seq=${pagePlan.seqVisits} (${pagePlan.execution} ms) | ${countPlan.indexes.join(', ') || '—'}; seq=${countPlan.seqVisits} (${countPlan.execution} ms)`,
    );
    if (process.env.BENCH_PLANS) console.log(pagePlan.text, '\n', countPlan.text);
  }
  const batch = visitBatchStatement(visitTableFilterSchema.parse({ tz: 'UTC' }), 50_000, 1000);
  const batchPlan = await planSummary(explain, batch.sql, batch.values);
  console.log(`export batch (1,000 rows after id 50,000): ${batchPlan.indexes.join(', ')}; seq=${batchPlan.seqVisits} (${batchPlan.execution} ms)`);
  if (process.env.BENCH_PLANS) console.log(batchPlan.text);
  await explain.end();

  {
    // The database side alone (batched keyset queries), to tell query time from CSV encoding time.
    const start = performance.now();
    let n = 0;
    for await (const batch of visitBatches(visitTableFilterSchema.parse({ tz: 'UTC' }))) n += batch.length;
    console.log(`\nbatched keyset reads alone: ${n} rows in ${((performance.now() - start) / 1000).toFixed(2)} s`);
  }
  for (const [name, raw] of [['CSV export, every visit', {}], ['CSV export, status closed+approved', { status: 'closed,approved' }]] as const) {
    const filter = visitTableFilterSchema.parse({ tz: 'UTC', ...raw });
    const rssBefore = process.memoryUsage().rss;
    let peak = rssBefore;
    let bytes = 0;
    let lines = 0;
    const start = performance.now();
    for await (const chunk of visitCsvChunks(filter)) {
      bytes += Buffer.byteLength(chunk);
      lines += chunk.split('\r\n').length - 1;
      peak = Math.max(peak, process.memoryUsage().rss);
    }
    const ms = performance.now() - start;
    console.log(`${name}: ${lines - 1} rows, ${(bytes / 1e6).toFixed(1)} MB in ${(ms / 1000).toFixed(2)} s; RSS grew by at most ${((peak - rssBefore) / 1e6).toFixed(1)} MB`);
  }
  await sequelize.close();
} finally {
  cleanUp();
}
