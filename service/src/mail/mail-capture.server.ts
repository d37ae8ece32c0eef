import { Logger } from '@nestjs/common';
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';

export interface CapturedMail {
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  headers: Record<string, string>;
  receivedAt: Date;
}

/**
 * A local stand-in for a hosted SMTP service, on loopback only: it accepts every message and keeps
 * the last ones in memory, so development and tests see exactly what a real mailbox would get.
 */
export class MailCaptureServer {
  private readonly log = new Logger('MailCapture');
  private server?: SMTPServer;
  readonly received: CapturedMail[] = [];
  /** Test hook: while set, every message is refused with this SMTP error. */
  failNext = 0;

  constructor(private readonly keep = 500) {}

  async start(port = 0): Promise<number> {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      banner: 'Fuelwright local mail capture',
      logger: false,
      onData: (stream, session, callback) => {
        if (this.failNext > 0) {
          this.failNext--;
          stream.resume();
          stream.on('end', () => callback(Object.assign(new Error('Mailbox unavailable (simulated)'), { responseCode: 451 })));
          return;
        }
        simpleParser(stream)
          .then((parsed) => {
            const headers: Record<string, string> = {};
            for (const [k, v] of parsed.headers) headers[k] = typeof v === 'string' ? v : JSON.stringify(v);
            this.received.push({
              from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
              to: session.envelope.rcptTo.map((r) => r.address),
              subject: parsed.subject ?? '',
              text: parsed.text ?? '',
              html: typeof parsed.html === 'string' ? parsed.html : '',
              headers,
              receivedAt: new Date(),
            });
            if (this.received.length > this.keep) this.received.splice(0, this.received.length - this.keep);
            callback();
          })
          .catch((e: Error) => callback(e));
      },
    });
    await new Promise<void>((resolve, reject) => {
      this.server!.once('error', reject);
      this.server!.listen(port, '127.0.0.1', () => resolve());
    });
    const address = (this.server as unknown as { server: { address(): { port: number } } }).server.address();
    this.log.log(`Capturing e-mail on smtp://127.0.0.1:${address.port} (development fake; nothing leaves this machine)`);
    return address.port;
  }

  async stop(): Promise<void> {
    if (this.server) await new Promise<void>((resolve) => this.server!.close(() => resolve()));
  }
}
