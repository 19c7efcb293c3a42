// The bench's data: accounts signed up through the API (so they are real accounts with real
// password hashes), then cultures, feedings and rise checks written straight into PostgreSQL in
// bulk (thousands of rows in a second or two). The histories follow a simple fermentation shape
// (a Gompertz rise to a temperature-dependent peak, then a slow fall) with noise, so the model
// does the same fitting work it does on a baker's real log. None of it is measured data.
import { randomUUID } from 'node:crypto';

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
export const PASSWORD = 'bench-Levain-starter-2026!';
export const CLASS_SIZE = 30;

/** Small seeded PRNG (mulberry32): every run seeds the same story. */
function random(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}
const normal = (rand) => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
const round1 = (x) => Math.round(x * 10) / 10;

/** Height over time: a modified Gompertz rise that reaches 95 % at the peak, then a slow fall. */
function heightAt(hours, h0, peakHours, multiple) {
  const A = multiple - 1;
  const lag = 0.3 * peakHours;
  const mu = (A * (1 - Math.log(-Math.log(0.95)))) / (Math.E * (peakHours - lag));
  const rise = A * Math.exp(-Math.exp(((mu * Math.E) / A) * (lag - hours) + 1));
  const fall = hours > peakHours + 1 ? 0.06 * (hours - peakHours - 1) : 0;
  return h0 * (1 + rise * Math.max(0, 1 - fall));
}

/**
 * A culture's daily log, oldest first: `days` days back from `now`, each day fed with probability
 * `logRate`, rise checks every 1–2 h up to 3 h past the peak on a share `checkRate` of feedings.
 * Time to peak ≈ 2.2 h × (0.6 + ln dilution), doubling per 10 °C cooler (common practice: a Q10
 * near 2); the kitchen swings ±4 °C over the year.
 */
export function history({ cultureId, days, now, seed, pace = 1, logRate = 1, checkRate = 1, ratio = [1, 2, 2] }) {
  const rand = random(seed);
  const feedings = [];
  const checks = [];
  for (let daysAgo = days; daysAgo >= 0; daysAgo -= 1) {
    if (daysAgo > 0 && rand() > logRate) continue;
    const fedAt = new Date(now - daysAgo * DAY - (daysAgo === 0 ? 3.5 : 8 + rand() * 3) * HOUR);
    const temperatureC = round1(22 + 4 * Math.sin((2 * Math.PI * daysAgo) / 365) + normal(rand) * 0.8);
    const starterG = 20 + Math.round(rand() * 4) * 5;
    const [s, f, w] = ratio;
    const dilution = (s + f + w) / s;
    const peakHours =
      2.2 * (0.6 + Math.log(dilution)) * Math.pow(2, (24 - temperatureC) / 10) * pace * Math.exp(0.12 * normal(rand));
    const h0 = round1(35 + rand() * 15);
    const multiple = 2 + rand() * 0.8;
    const id = randomUUID();
    feedings.push({
      id,
      cultureId,
      fedAt,
      starterG,
      flourG: (starterG * f) / s,
      waterG: (starterG * w) / s,
      temperatureC,
      initialHeightMm: h0,
    });
    if (rand() > checkRate) continue;
    for (let hours = 1 + rand(); hours < peakHours + 3; hours += 1 + rand()) {
      const takenAt = new Date(fedAt.getTime() + hours * HOUR);
      if (takenAt.getTime() > now) break;
      const heightMm = round1(heightAt(hours, h0, peakHours, multiple) + normal(rand) * 0.7);
      checks.push({ feedingId: id, takenAt, heightMm, temperatureC: round1(temperatureC + normal(rand) * 0.4) });
    }
  }
  return { feedings, checks };
}

async function insertFeedings(client, rows) {
  for (let i = 0; i < rows.length; i += 5000) {
    const part = rows.slice(i, i + 5000);
    const col = (k) => part.map((r) => r[k]);
    await client.query(
      `INSERT INTO feeding (id, culture_id, fed_at, starter_g, flour_g, water_g, flour, temperature_c,
                            initial_height_mm, observations)
       SELECT id, culture_id, fed_at, starter_g, flour_g, water_g, 'bread flour', temperature_c, h0, '{bubbles}'
       FROM unnest($1::uuid[], $2::uuid[], $3::timestamptz[], $4::float8[], $5::float8[], $6::float8[],
                   $7::float8[], $8::float8[])
            AS t(id, culture_id, fed_at, starter_g, flour_g, water_g, temperature_c, h0)`,
      [
        col('id'),
        col('cultureId'),
        col('fedAt'),
        col('starterG'),
        col('flourG'),
        col('waterG'),
        col('temperatureC'),
        col('initialHeightMm'),
      ],
    );
  }
}

async function insertChecks(client, rows) {
  for (let i = 0; i < rows.length; i += 10000) {
    const part = rows.slice(i, i + 10000);
    const col = (k) => part.map((r) => r[k]);
    await client.query(
      `INSERT INTO rise_check (feeding_id, taken_at, height_mm, temperature_c)
       SELECT * FROM unnest($1::uuid[], $2::timestamptz[], $3::float8[], $4::float8[])`,
      [col('feedingId'), col('takenAt'), col('heightMm'), col('temperatureC')],
    );
  }
}

async function insertCulture(client, accountId, name, startedDaysAgo, now) {
  const id = randomUUID();
  await client.query(
    `INSERT INTO culture (id, account_id, name, default_flour, default_hydration_pct, location, started_on)
     VALUES ($1, $2, $3, 'bread flour', 100, 'counter', $4::date)`,
    [id, accountId, name, new Date(now - startedDaysAgo * DAY).toISOString().slice(0, 10)],
  );
  return id;
}

async function signUp(baseUrl, email, displayName) {
  const response = await fetch(`${baseUrl}/api/auth/sign-up`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, displayName, password: PASSWORD, timeZone: 'Europe/London' }),
  });
  if (response.status !== 201) throw new Error(`sign-up of ${email}: ${response.status} ${await response.text()}`);
  return (await response.json()).id;
}

/** Signs in once through POST /api/auth/sign-in; returns the Cookie header for later requests. */
export async function signIn(baseUrl, email) {
  const response = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: PASSWORD }),
  });
  if (response.status !== 200) throw new Error(`sign-in of ${email}: ${response.status} ${await response.text()}`);
  const cookie = response.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .find((c) => c.startsWith('peakwise.sid='));
  if (!cookie) throw new Error(`sign-in of ${email} set no session cookie`);
  return cookie;
}

/**
 * Seeds:
 * - baker@bench: "Three Years" (daily feedings with rise checks for three years) and two younger
 *   cultures — the culture-summary bench and the Shelf that Lighthouse loads;
 * - poster@bench: 20 cultures with two weeks of log each, fed by the feeding-POST benches in turn;
 * - teacher@bench, an instructor, with a class of 30 students who joined three weeks ago, each
 *   with one culture and 120 days of log (some skip days or rise checks; a few are sluggish).
 */
export async function seed({ baseUrl, client, now = Date.now() }) {
  const started = Date.now();
  const baker = await signUp(baseUrl, 'baker@bench.example', 'Bench Baker');
  const poster = await signUp(baseUrl, 'poster@bench.example', 'Bench Poster');
  const teacher = await signUp(baseUrl, 'teacher@bench.example', 'Bench Teacher');
  const students = [];
  for (let i = 0; i < CLASS_SIZE; i += 6) {
    const batch = Array.from({ length: Math.min(6, CLASS_SIZE - i) }, (_, j) => i + j + 1);
    students.push(
      ...(await Promise.all(
        batch.map((n) => signUp(baseUrl, `student${n}@bench.example`, `Student ${String(n).padStart(2, '0')}`)),
      )),
    );
  }

  const feedings = [];
  const checks = [];
  const add = (h) => {
    feedings.push(...h.feedings);
    checks.push(...h.checks);
  };
  await client.query('BEGIN');
  const threeYears = await insertCulture(client, baker, 'Three Years', 3 * 365 + 10, now);
  add(history({ cultureId: threeYears, days: 3 * 365, now, seed: 1 }));
  for (const [i, name] of ['Rye Jar', 'Spelt Jar'].entries()) {
    const id = await insertCulture(client, baker, name, 70, now);
    add(history({ cultureId: id, days: 60, now, seed: 2 + i, ratio: [1, 1, 1] }));
  }
  const posterCultures = [];
  for (let i = 0; i < 20; i++) {
    const id = await insertCulture(client, poster, `Jar ${i + 1}`, 20, now);
    posterCultures.push(id);
    add(history({ cultureId: id, days: 14, now, seed: 100 + i }));
  }
  const classId = randomUUID();
  await client.query(`UPDATE account SET role = 'instructor' WHERE id = $1`, [teacher]);
  await client.query(
    `INSERT INTO baking_class (id, instructor_id, name, starts_on, ends_on)
     VALUES ($1, $2, 'Bench Class', $3::date, $4::date)`,
    [
      classId,
      teacher,
      new Date(now - 21 * DAY).toISOString().slice(0, 10),
      new Date(now + 21 * DAY).toISOString().slice(0, 10),
    ],
  );
  for (const [i, student] of students.entries()) {
    await client.query(`INSERT INTO class_member (class_id, account_id, joined_at) VALUES ($1, $2, $3)`, [
      classId,
      student,
      new Date(now - 21 * DAY),
    ]);
    const rand = random(500 + i);
    const id = await insertCulture(client, student, `Culture ${i + 1}`, 130, now);
    add(
      history({
        cultureId: id,
        days: 120,
        now,
        seed: 1000 + i,
        pace: i % 7 === 3 ? 1.6 : 0.85 + rand() * 0.3,
        logRate: 0.7 + rand() * 0.3,
        checkRate: 0.6 + rand() * 0.4,
      }),
    );
  }
  await insertFeedings(client, feedings);
  await insertChecks(client, checks);
  await client.query('COMMIT');
  // A live database has statistics; without them the first plans would be guesses.
  await client.query('ANALYZE');
  return {
    threeYears,
    posterCultures,
    classId,
    counts: { accounts: 3 + students.length, feedings: feedings.length, riseChecks: checks.length },
    seconds: (Date.now() - started) / 1000,
  };
}
