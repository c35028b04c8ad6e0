import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo, Socket } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_UPLOADS_PER_USER } from '../../server/modules/attachments/photo-upload';
import { plainJpeg } from '../../server/modules/attachments/test-images';
import { Visit } from '../../server/modules/visits/visits.model';
import { useApiApp } from '../api-app';
import { TEST_PASSWORD, makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

// Uploads are refused before their body is read: the declared length, the uploads on their way,
// and the caller's access to the visit are all checked first.

const uploadDir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-upload-refusal-'));
const MAX_BYTES = 8 * 1024 * 1024;
const db = useTestDatabase();
const { app } = useApiApp(db, { UPLOAD_DIR: uploadDir, UPLOAD_MAX_BYTES: String(MAX_BYTES) });

let server: http.Server;
let origin: string;
const serverSockets: Socket[] = [];
let ownerCookie: string;
let otherCookie: string;
let ownersVisit: Visit;

async function makeOpenVisit(technicianId: number): Promise<Visit> {
  const { press } = await makePress();
  const visit = await Visit.create({ pressId: press.id, technicianId, controlFirmwareFound: null, monitorFirmwareFound: null, procedureId: null, bandSetId: null, firmwareRuleSetId: null, startedAt: null, closedAt: null });
  return visit.update({ status: 'in_progress', startedAt: new Date() });
}

async function cookieOf(email: string): Promise<string> {
  const res = await supertest(server).post('/api/session').set('Origin', origin).send({ email, password: TEST_PASSWORD });
  expect(res.status).toBe(200);
  return (res.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ');
}

const tempFolder = () => path.join(uploadDir, 'tmp');
const tempEntries = () => (fs.existsSync(tempFolder()) ? fs.readdirSync(tempFolder()) : []);

async function until(what: string, check: () => boolean, ms = 5000): Promise<void> {
  const end = Date.now() + ms;
  while (!check()) {
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 20));
  }
}

const BOUNDARY = 'cw-test-boundary';
const filePartHead = Buffer.from(`--${BOUNDARY}\r\nContent-Disposition: form-data; name="photos"; filename="big.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`);
const formTail = Buffer.from(`\r\n--${BOUNDARY}--\r\n`);

interface StreamedUpload {
  /** The answer's status and body, and how much of the body the client had written when it came. */
  answer: Promise<{ status: number; body: string; bytesWrittenBeforeAnswer: number; totalBytes: number }>;
  /** The server side of the connection, once it is known. */
  serverSocket: () => Socket | undefined;
  abort: () => void;
}

/**
 * Sends one multipart body of `fileBytes` bytes of filler in 64 KiB chunks, waiting for the socket
 * to drain between chunks, and stops writing once an answer arrives. `holdAfter` stops writing
 * after that many bytes without ending the request (an upload still on its way).
 */
function streamUpload(visitId: number, cookie: string, fileBytes: number, holdAfter?: number): StreamedUpload {
  const totalBytes = filePartHead.length + fileBytes + formTail.length;
  const socketsBefore = serverSockets.length;
  const req = http.request(`${origin}/api/visits/${visitId}/attachments`, {
    method: 'POST',
    agent: false,
    headers: { Cookie: cookie, Origin: origin, 'Content-Type': `multipart/form-data; boundary=${BOUNDARY}`, 'Content-Length': String(totalBytes) },
  });
  let written = 0;
  let answered = false;
  const answer = new Promise<{ status: number; body: string; bytesWrittenBeforeAnswer: number; totalBytes: number }>((resolve, reject) => {
    req.on('response', (res) => {
      answered = true;
      const at = written;
      let body = '';
      res.setEncoding('utf8');
      res.on('data', (d: string) => (body += d));
      res.on('end', () => resolve({ status: res.statusCode!, body, bytesWrittenBeforeAnswer: at, totalBytes }));
      res.on('error', reject);
    });
    // Writing into a connection the server has closed fails; the answer already came, so that is expected.
    req.on('error', (err) => {
      if (!answered) reject(err);
    });
  });
  const chunk = Buffer.alloc(64 * 1024, 0x41);
  void (async () => {
    const write = (b: Buffer) =>
      new Promise<void>((resolve) => {
        if (req.write(b)) return resolve();
        const done = () => {
          req.off('drain', done).off('close', done);
          resolve();
        };
        req.on('drain', done).on('close', done);
      });
    await write(filePartHead);
    written += filePartHead.length;
    for (let sent = 0; sent < fileBytes && !answered && !req.destroyed; ) {
      if (holdAfter !== undefined && sent >= holdAfter) return;
      const piece = chunk.subarray(0, Math.min(chunk.length, fileBytes - sent));
      await write(piece);
      sent += piece.length;
      written += piece.length;
    }
    if (!answered && !req.destroyed) {
      req.end(formTail);
      written += formTail.length;
    }
  })();
  return { answer, serverSocket: () => serverSockets[socketsBefore], abort: () => req.destroy() };
}

beforeAll(async () => {
  server = http.createServer(app());
  server.on('connection', (s) => serverSockets.push(s));
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const owner = await makeUser('technician');
  const other = await makeUser('technician');
  ownerCookie = await cookieOf(owner.email);
  otherCookie = await cookieOf(other.email);
  ownersVisit = await makeOpenVisit(owner.id);
});

afterAll(async () => {
  server.closeAllConnections();
  await new Promise((resolve) => server.close(resolve));
  fs.rmSync(uploadDir, { recursive: true, force: true });
});

describe('an upload the caller may not make is refused before its body is read', () => {
  it("answers another technician's 40 MB upload with 404 while it is still being sent, having read almost none of it", async () => {
    const upload = streamUpload(ownersVisit.id, otherCookie, 40 * 1024 * 1024);
    const result = await upload.answer;
    expect(result.status).toBe(404);
    expect(JSON.parse(result.body).error.code).toBe('not_found');
    // The client was still writing when the answer came.
    expect(result.bytesWrittenBeforeAnswer).toBeLessThan(result.totalBytes);
    // The server closes the connection rather than reading the rest: what it read from the socket
    // (headers and whatever the kernel had buffered) stays far below the 40 MB sent.
    await until('the server to close the connection', () => upload.serverSocket()?.destroyed === true);
    const bytesRead = upload.serverSocket()!.bytesRead;
    expect(bytesRead).toBeLessThan(4 * 1024 * 1024);
    expect(tempEntries()).toEqual([]);
  });

  it('answers a body declared larger than six photos may be with 413 before reading it', async () => {
    const upload = streamUpload(ownersVisit.id, ownerCookie, 6 * MAX_BYTES + 1024 * 1024);
    const result = await upload.answer;
    expect(result.status).toBe(413);
    expect(JSON.parse(result.body).error).toMatchObject({ code: 'file_too_large', message: expect.stringContaining('8.0 MB') });
    await until('the server to close the connection', () => upload.serverSocket()?.destroyed === true);
    expect(upload.serverSocket()!.bytesRead).toBeLessThan(4 * 1024 * 1024);
    expect(tempEntries()).toEqual([]);
  });

  it(`lets one person have ${MAX_UPLOADS_PER_USER} uploads on their way, refuses the next with 429, and removes the temp files of aborted ones`, async () => {
    const held = Array.from({ length: MAX_UPLOADS_PER_USER }, () => streamUpload(ownersVisit.id, ownerCookie, 4 * 1024 * 1024, 256 * 1024));
    for (const h of held) h.answer.catch(() => undefined);
    // Each held upload has passed the checks once multer has made its temp folder.
    await until('the held uploads to reach their temp files', () => tempEntries().length === MAX_UPLOADS_PER_USER);

    const refused = await streamUpload(ownersVisit.id, ownerCookie, 1024 * 1024).answer;
    expect(refused.status).toBe(429);
    expect(JSON.parse(refused.body).error.code).toBe('uploads_busy');

    for (const h of held) h.abort();
    await until('the temp files of aborted uploads to go', () => tempEntries().length === 0);

    // The slots are free again: a real photo goes through, and leaves no temp file.
    const agent = supertest(server);
    const ok = await agent.post(`/api/visits/${ownersVisit.id}/attachments`).set('Cookie', ownerCookie).set('Origin', origin).attach('photos', await plainJpeg(), 'a.jpg');
    expect(ok.status).toBe(201);
    expect(tempEntries()).toEqual([]);
  });
});
