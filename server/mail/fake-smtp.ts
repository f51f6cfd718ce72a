/**
 * A local stand-in for a mail server, for development and tests: it accepts
 * every message on 127.0.0.1 (no TLS, any or no login) and stores each one as
 * a JSON file in `dir` (see mail-store.ts), where the app's development mail
 * reader and the tests (separate processes) read it. Nothing is delivered.
 *
 * Example: const smtp = await startFakeSmtp({ port: 2525, dir: '.data/mail' });
 *          … await smtp.close();
 */
import { SMTPServer } from 'smtp-server';
import { saveMail } from './mail-store';
import { parseMessage } from './mime';

export type FakeSmtp = {
  /** The port it listens on (useful with port 0: any free port). */
  port: number;
  close: () => Promise<void>;
};

/** Largest message accepted, bytes (a tape PDF is well under this). */
const maxMessageBytes = 10 * 1024 * 1024;

export function startFakeSmtp({ port, dir, host = '127.0.0.1' }: { port: number; dir: string; host?: string }): Promise<FakeSmtp> {
  const server = new SMTPServer({
    name: 'pinwright-fake-smtp',
    banner: 'Pinwright development mail catcher: nothing is delivered',
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: maxMessageBytes,
    logger: false,
    onAuth(_auth, _sight_in, callback) {
      callback(null, { user: 'development' });
    },
    onData(stream, sightIn, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        if (stream.sizeExceeded) {
          callback(Object.assign(new Error('Message too large for the development mail catcher'), { responseCode: 552 }));
          return;
        }
        try {
          const raw = Buffer.concat(chunks);
          const from = sightIn.envelope.mailFrom ? sightIn.envelope.mailFrom.address : '';
          const to = sightIn.envelope.rcptTo.map((r) => r.address);
          saveMail(dir, { from, to }, parseMessage(raw));
          callback();
        } catch (err) {
          callback(err as Error);
        }
      });
    },
  });

  return new Promise((resolve, reject) => {
    const onError = (err: Error) => reject(err);
    server.once('error', onError);
    server.listen(port, host, () => {
      server.off('error', onError);
      // A broken client connection must not bring the process down.
      server.on('error', (err) => console.error(`fake SMTP: ${err.message}`));
      const address = server.server.address();
      const boundPort = typeof address === 'object' && address ? address.port : port;
      resolve({
        port: boundPort,
        close: () => new Promise<void>((done) => server.close(() => done())),
      });
    });
  });
}
