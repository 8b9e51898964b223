// `npm run reset`: forget the demo's database, objects and mail, so the next `npm start` begins
// with freshly seeded demo data. Asks first unless given --yes.
import { rmSync, existsSync } from 'node:fs'
import path from 'node:path'
import readline from 'node:readline/promises'
import { ROOT } from './lib/setup.mjs'
import { clusterDir, startPostgres } from './lib/postgres.mjs'
import { portInUse } from './lib/proc.mjs'

if (await portInUse(Number(process.env.PORT ?? 3300))) {
  console.error('Ionfolio seems to be running: stop it (Ctrl-C in its terminal) before resetting.')
  process.exit(1)
}
if (!process.argv.includes('--yes')) {
  const rl = readline.createInterface({ input: process.stdin, output: process.stdout })
  const answer = await rl.question('This deletes the demo database, stored files and mail under storage/. Type "reset" to go on: ')
  rl.close()
  if (answer.trim() !== 'reset') {
    console.log('Nothing was deleted.')
    process.exit(0)
  }
}
const storage = path.join(ROOT, 'storage')
const pgDir = clusterDir(path.join(storage, 'postgres'))
if (existsSync(path.join(pgDir, 'data', 'PG_VERSION'))) startPostgres({ dir: pgDir, port: Number(process.env.IONFOLIO_PG_PORT ?? 55432) }).stop()
for (const dir of [pgDir, path.join(storage, 'postgres'), path.join(storage, 'objects'), path.join(storage, 'mail'), path.join(storage, 'database-logins.json')]) rmSync(dir, { recursive: true, force: true })
console.log('Demo data removed; `npm start` seeds it afresh.')
