// `npm run -s model -- <command>`: one JSON object on stdin, one JSON object on stdout.
// Bad input exits 2 with {"error": "...", "path": "..."} naming the offending field.
import { readFileSync } from 'node:fs';
import { COMMANDS } from './commands.js';
import { BakersMathError } from '../fermentation/units/bakers-math-error.js';
import { InputError, object, type Json } from './input.js';

function fail(error: string, path: string): never {
  process.stdout.write(JSON.stringify({ error, path }) + '\n');
  process.exit(2);
}

const name = process.argv[2];
const command = name ? COMMANDS[name] : undefined;
if (!command) {
  fail(`unknown command ${JSON.stringify(name ?? '')}; one of: ${Object.keys(COMMANDS).join(', ')}`, '');
}

let input: Json;
try {
  input = JSON.parse(readFileSync(0, 'utf8')) as Json;
} catch {
  fail('stdin is not valid JSON', '');
}

try {
  const output = command(object(input, ''));
  process.stdout.write(JSON.stringify(output, null, 2) + '\n');
} catch (error) {
  if (error instanceof InputError || error instanceof BakersMathError) fail(error.message, error.path);
  throw error;
}
