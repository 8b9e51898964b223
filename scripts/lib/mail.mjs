// Mail stand-ins. The demo gets a web inbox (maildev) so a person can open the invitation;
// the tests get an in-process SMTP server whose messages land as JSON files the tests read.
import { mkdirSync, writeFileSync } from 'node:fs'
import path from 'node:path'

/** The demo's SMTP fake with a web inbox on loopback. */
export async function startMailInbox({ smtpPort, webPort, directory }) {
  mkdirSync(directory, { recursive: true })
  const { MailDev } = await import('maildev')
  const maildev = new MailDev({ smtp: smtpPort, ip: '127.0.0.1', web: webPort, webIp: '127.0.0.1', mailDirectory: directory, silent: true, logLevel: 'silent' })
  await maildev.start()
  return { url: `http://127.0.0.1:${webPort}`, stop: () => maildev.stop().catch(() => {}) }
}

/** The tests' SMTP fake: every message received is parsed and written to `spool` as JSON. */
export async function startMailSpool({ port, spool }) {
  mkdirSync(spool, { recursive: true })
  const { SMTPServer } = await import('smtp-server')
  const { simpleParser } = await import('mailparser')
  let count = 0
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((mail) => {
          count += 1
          const record = {
            to: session.envelope.rcptTo.map((r) => r.address),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : null,
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : '',
            receivedAt: new Date().toISOString(),
          }
          const name = `${String(Date.now()).padStart(14, '0')}-${String(count).padStart(5, '0')}.json`
          writeFileSync(path.join(spool, name), JSON.stringify(record, null, 2))
          callback()
        })
        .catch(callback)
    },
  })
  await new Promise((resolve, reject) => {
    server.once('error', reject)
    server.listen(port, '127.0.0.1', resolve)
  })
  return { port, spool, stop: () => new Promise((r) => server.close(r)) }
}
