// `node api/dist/src/cli/seed.js`: puts the demo scenario into an empty database and writes the
// sign-ins it made to $PEAKWISE_DATA_DIR/demo-accounts.json (mode 600), which `npm start` prints.
// Passwords come from PEAKWISE_DEMO_PASSWORD, or are generated: there is no well-known default.
import { randomBytes } from 'node:crypto';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Role } from '@peakwise/shared';
import { AccountRepository } from '../account/account.repository.js';
import { AccountService } from '../account/account.service.js';
import { PasswordService } from '../auth/password.service.js';
import type { AppConfig } from '../config.js';
import { openDatabase } from '../db/database.js';
import { scheduleDemoAlerts } from './demo-alerts.js';
import { seedDemoClassroom } from './demo-classroom.js';
import { seedDemoFormulas } from './demo-formulas.js';
import { seedDemoLogbook } from './demo-logbook.js';
import { registerDemoPushDevice } from './demo-push.js';

// The invented Larkspur Community Kitchen and its "Weekend Levain" class.
const PEOPLE: { displayName: string; email: string; role: Role }[] = [
  { displayName: 'Ines Marlow', email: 'ines@larkspur-kitchen.example', role: 'instructor' },
  { displayName: 'Theo Park', email: 'theo@larkspur-kitchen.example', role: 'baker' },
  { displayName: 'Amara Quist', email: 'amara@larkspur-kitchen.example', role: 'baker' },
  { displayName: 'Dev Rowan', email: 'dev@larkspur-kitchen.example', role: 'baker' },
  { displayName: 'Kitchen Office', email: 'office@larkspur-kitchen.example', role: 'admin' },
];

const url = process.env.DATABASE_URL;
if (!url) {
  process.stderr.write('DATABASE_URL is not set\n');
  process.exit(2);
}
const { db } = openDatabase(url, 2);
try {
  const repository = new AccountRepository(db);
  if ((await repository.count()) > 0) {
    process.stdout.write('database already has accounts; demo seed skipped\n');
  } else {
    const passwords = new PasswordService({ passwordHashCost: 17 } as AppConfig);
    const service = new AccountService(repository, passwords);
    const shared = process.env.PEAKWISE_DEMO_PASSWORD;
    const made = [];
    const accountIds = new Map<string, string>();
    for (const person of PEOPLE) {
      const password = shared ?? `loaf-${randomBytes(9).toString('base64url')}`;
      const account = await service.signUp({ ...person, password, timeZone: 'Europe/London' }, person.role);
      accountIds.set(person.email, account.id);
      made.push({ ...person, password });
    }
    const now = new Date();
    const { feedings, cultureIds } = await seedDemoLogbook(db, accountIds, now);
    process.stdout.write(`seeded ${feedings} demo feedings with their rise checks\n`);
    if (await seedDemoClassroom(db, accountIds, cultureIds, now)) process.stdout.write('seeded the demo class\n');
    const theo = accountIds.get('theo@larkspur-kitchen.example');
    if (theo && (await registerDemoPushDevice(db, theo)))
      process.stdout.write('gave Theo a demo phone on the fake push service\n');
    const alerts = await scheduleDemoAlerts(db, [...cultureIds.values()], now);
    process.stdout.write(`scheduled ${alerts} demo alerts (the API queues them when it starts)\n`);
    process.stdout.write(`seeded ${await seedDemoFormulas(db, accountIds)} demo formulas\n`);
    const dataDir = process.env.PEAKWISE_DATA_DIR;
    if (dataDir) {
      mkdirSync(dataDir, { recursive: true });
      writeFileSync(join(dataDir, 'demo-accounts.json'), JSON.stringify(made, null, 2) + '\n', { mode: 0o600 });
    }
    process.stdout.write(`seeded ${made.length} demo accounts\n`);
  }
} finally {
  await db.destroy();
}
