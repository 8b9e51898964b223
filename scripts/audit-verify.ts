// `npm run audit-verify FILE.csv`: says whether an audit CSV exported by Ionfolio is complete and
// unaltered (the hash chain of shared/audit/chain.ts), and if not, the first line that breaks.
// Exit code 0 when intact, 1 when not, 2 when the file cannot be read.
import { readFile } from 'node:fs/promises'
import { verifyAuditCsv } from '../shared/audit/chain'

const file = process.argv[2]
if (!file) {
  console.error('usage: npm run audit-verify FILE.csv')
  process.exit(2)
}
let text: string
try {
  text = await readFile(file, 'utf8')
} catch (e) {
  console.error(`cannot read ${file}: ${(e as Error).message}`)
  process.exit(2)
}
const v = await verifyAuditCsv(text)
if (v.ok) {
  console.log(`${file}: complete and unaltered, ${v.rows} rows, last hash ${v.lastHash}`)
} else {
  console.log(`${file}: NOT as exported, line ${v.line}: ${v.problem} (${v.rowsChecked} rows intact before it)`)
  process.exit(1)
}
