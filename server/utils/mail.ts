import nodemailer, { type Transporter } from 'nodemailer'

let transport: Transporter | null = null

/** The one SMTP transport, from runtimeConfig.smtp; any SMTP relay works through the same settings. */
export function useMailer(): Transporter {
  if (!transport) {
    const { smtp } = useRuntimeConfig()
    const secure = String(smtp.secure) === 'true'
    transport = nodemailer.createTransport({
      host: smtp.host,
      port: Number(smtp.port),
      secure,
      ignoreTLS: !secure && ['127.0.0.1', 'localhost'].includes(String(smtp.host)),
      auth: smtp.user ? { user: String(smtp.user), pass: String(smtp.pass) } : undefined,
      pool: true,
      connectionTimeout: 5_000,
      greetingTimeout: 5_000,
    })
  }
  return transport
}

export interface OutgoingMail {
  to: string | string[]
  subject: string
  text: string
  html: string
}

/** Sends one message as HTML with a plain-text alternative. */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  const { smtp } = useRuntimeConfig()
  await useMailer().sendMail({ from: String(smtp.from), ...mail })
}

/** Closes the SMTP pool (Nitro's close hook). */
export function closeMailer(): void {
  transport?.close()
  transport = null
}

/** Escapes text for an HTML mail body. */
export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!)
}
