// The local mail inbox for `npm start`: maildev (SMTP + web inbox) on loopback, its web side behind a
// small proxy that answers only its own page. maildev's API reflects any Origin with credentials,
// so without the proxy any web page open on this machine could read every report and invitation link.
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import http from 'node:http';
import net from 'node:net';
import { freePort } from './pg-cluster';

export interface MailInbox {
  smtpPort: number;
  /** The inbox page, e.g. http://127.0.0.1:1080/ */
  inboxUrl: string;
  stop: () => void;
}

/** Starts maildev with its mail kept in `mailDir` (mode 0700: the messages hold live links). */
export async function startMailInbox(opts: { mailDir: string; smtpPort?: number; webPort?: number }): Promise<MailInbox> {
  fs.mkdirSync(opts.mailDir, { recursive: true, mode: 0o700 });
  fs.chmodSync(opts.mailDir, 0o700);
  const smtpPort = await freePort(opts.smtpPort ?? 1025);
  const innerPort = await freePort(0);
  const webPort = await freePort(opts.webPort ?? 1080);
  const args = ['--smtp', String(smtpPort), '--ip', '127.0.0.1', '--web', String(innerPort), '--web-ip', '127.0.0.1', '--hide-extensions', 'STARTTLS', '--mail-directory', opts.mailDir];
  const child: ChildProcess = spawn(process.execPath, ['node_modules/maildev/dist/bin/maildev.js', ...args], { stdio: ['ignore', 'ignore', 'pipe'] });
  let errors = '';
  child.stderr?.on('data', (d: Buffer) => (errors += d.toString()));
  const exited = new Promise<never>((_, reject) => child.once('exit', (code) => reject(new Error(`maildev exited (${code ?? 'signal'}) ${errors.trim()}`))));
  exited.catch(() => {});

  const proxy = sameOriginProxy(innerPort, webPort);
  const stop = () => {
    proxy.close();
    proxy.closeAllConnections();
    child.kill('SIGTERM');
  };
  try {
    await new Promise<void>((resolve, reject) => {
      proxy.once('error', reject);
      proxy.listen(webPort, '127.0.0.1', resolve);
    });
    for (let i = 0; ; i++) {
      // The inbox page answers only browsers (Accept: text/html); its REST API answers anyone.
      const up = await Promise.race([fetch(`http://127.0.0.1:${innerPort}/api/email`).then((r) => r.ok, () => false), exited]);
      if (up) break;
      if (i >= 100) throw new Error('maildev did not answer within 20 s');
      await new Promise((r) => setTimeout(r, 200));
    }
  } catch (err) {
    stop();
    throw err;
  }
  return { smtpPort, inboxUrl: `http://127.0.0.1:${webPort}/`, stop };
}

/** Forwards to maildev on `innerPort`; refuses any request a page of another origin sends. */
function sameOriginProxy(innerPort: number, webPort: number): http.Server {
  const own = new Set([`http://127.0.0.1:${webPort}`, `http://localhost:${webPort}`]);
  const allowed = (req: http.IncomingMessage) => {
    const origin = req.headers.origin;
    const site = req.headers['sec-fetch-site'];
    if (origin !== undefined && !own.has(origin)) return false;
    return site === undefined || site === 'same-origin' || site === 'none';
  };
  const server = http.createServer((req, res) => {
    if (!allowed(req)) {
      res.writeHead(403, { 'content-type': 'text/plain; charset=utf-8' }).end('The mail inbox answers only its own page.\n');
      return;
    }
    const upstream = http.request({ host: '127.0.0.1', port: innerPort, method: req.method, path: req.url, headers: req.headers }, (up) => {
      const headers = Object.fromEntries(Object.entries(up.headers).filter(([name]) => !name.startsWith('access-control-')));
      res.writeHead(up.statusCode ?? 502, headers);
      up.pipe(res);
    });
    upstream.on('error', () => {
      if (!res.headersSent) res.writeHead(502, { 'content-type': 'text/plain; charset=utf-8' });
      res.end('The mail inbox is not answering.\n');
    });
    req.pipe(upstream);
  });
  // The inbox page's live updates use a WebSocket: pass the upgrade through byte for byte.
  server.on('upgrade', (req, socket, head) => {
    if (!allowed(req)) {
      socket.end('HTTP/1.1 403 Forbidden\r\nConnection: close\r\n\r\n');
      return;
    }
    const upstream = net.connect(innerPort, '127.0.0.1', () => {
      const lines = [`${req.method} ${req.url} HTTP/${req.httpVersion}`];
      for (let i = 0; i < req.rawHeaders.length; i += 2) lines.push(`${req.rawHeaders[i]}: ${req.rawHeaders[i + 1]}`);
      upstream.write(`${lines.join('\r\n')}\r\n\r\n`);
      if (head.length) upstream.write(head);
      socket.pipe(upstream).pipe(socket);
    });
    const close = () => {
      socket.destroy();
      upstream.destroy();
    };
    upstream.on('error', close);
    socket.on('error', close);
  });
  return server;
}
