import { randomUUID } from 'node:crypto';
import { createWriteStream } from 'node:fs';
import { rename } from 'node:fs/promises';
import type { AddressInfo } from 'node:net';
import { join } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { SMTPServer } from 'smtp-server';

const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

/**
 * The local stand-in for a plant mail server: accepts anything on loopback and keeps each
 * message as an .eml file in `folder`, where GET /api/admin/mail reads them back.
 */
export class FakeSmtp {
  private readonly server: SMTPServer;

  constructor(private readonly folder: string) {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      size: MAX_MESSAGE_BYTES,
      logger: false,
      onData: (stream, _session, done) => {
        const name = `${new Date().toISOString().replace(/[:.]/g, '-')}-${randomUUID()}`;
        const partial = join(this.folder, `${name}.part`);
        // Written aside and renamed, so a reader never sees half a message.
        pipeline(stream, createWriteStream(partial))
          .then(() => rename(partial, join(this.folder, `${name}.eml`)))
          .then(() => done(), done);
      },
    });
  }

  /** Listens on a free loopback port and returns it. */
  listen(): Promise<number> {
    return new Promise((resolve, reject) => {
      this.server.once('error', reject);
      this.server.listen(0, '127.0.0.1', () => {
        resolve((this.server.server.address() as AddressInfo).port);
      });
    });
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}
