import fs from 'node:fs';
import path from 'node:path';
import { simpleParser, type ParsedMail } from 'mailparser';
import { inject } from 'vitest';

/** Waits until a message to `to` beyond the first `skip` arrives in the capturing SMTP server, and parses it. */
export async function waitForMail(to: string, { skip = 0, timeoutMs = 20_000 } = {}): Promise<ParsedMail> {
  const dir = inject('mailDir');
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const mails: ParsedMail[] = [];
    for (const file of fs.readdirSync(dir).sort()) {
      const mail = await simpleParser(fs.readFileSync(path.join(dir, file)));
      const addresses = [mail.to].flat().flatMap((a) => a?.value ?? []).map((v) => v.address);
      if (addresses.includes(to)) mails.push(mail);
    }
    if (mails.length > skip) return mails[skip]!;
    if (Date.now() > deadline) throw new Error(`no e-mail #${skip + 1} to ${to} arrived within ${timeoutMs} ms (${mails.length} so far)`);
    await new Promise((r) => setTimeout(r, 250));
  }
}
