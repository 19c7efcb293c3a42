// The baseline for the feeding POST: the same INSERT into the same table with the same columns,
// through bare Fastify + pg, without Nest, validation, sessions, idempotency or alert refreshes.
// Run by main.mjs as its own process (DATABASE_URL, PORT); the pool is the API's size (10).
import Fastify from 'fastify';
import pg from 'pg';

const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 10 });
const app = Fastify({ logger: false });

const INSERT = `
  INSERT INTO feeding (culture_id, fed_at, starter_g, flour_g, water_g, flour, water_temperature_c,
                       temperature_c, initial_height_mm, notes, observations)
  VALUES ($1, coalesce($2::timestamptz, now()), $3, $4, $5, $6, $7, $8, $9, $10, $11)
  RETURNING *`;

app.get('/health', async () => ({ ok: true }));

app.post('/api/cultures/:cultureId/feedings', async (request, reply) => {
  const b = request.body;
  const { rows } = await pool.query(INSERT, [
    request.params.cultureId,
    b.fedAt ?? null,
    b.starterG,
    b.flourG,
    b.waterG,
    b.flour ?? null,
    b.waterTemperatureC ?? null,
    b.temperatureC ?? null,
    b.initialHeightMm ?? null,
    b.notes ?? null,
    b.observations ?? [],
  ]);
  reply.code(201);
  return rows[0];
});

await app.listen({ host: '127.0.0.1', port: Number(process.env.PORT) });

const stop = async () => {
  await app.close();
  await pool.end();
  process.exit(0);
};
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
