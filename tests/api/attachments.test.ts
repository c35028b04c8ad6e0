import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import type supertest from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { SessionUser } from '../../shared/schemas/session';
import { Attachment } from '../../server/modules/attachments/attachments.model';
import { createAttachmentService, storeSignature } from '../../server/modules/attachments/attachments.service';
import { DiskStorage, type FileStorage } from '../../server/lib/file-storage';
import { TEST_CAMERA_MAKE, cameraJpeg, gif, heicContainer, noisyJpeg, plainJpeg, pngWithAlpha, svg, truncatedJpeg, webp } from '../../server/modules/attachments/test-images';
import { Visit } from '../../server/modules/visits/visits.model';
import type { User } from '../../server/modules/users/users.model';
import { anonymous, signedInAgent, useApiApp } from '../api-app';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

const uploadDir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-uploads-'));
const MAX_BYTES = 400_000;
const db = useTestDatabase();
const { app } = useApiApp(db, { UPLOAD_DIR: uploadDir, UPLOAD_MAX_BYTES: String(MAX_BYTES) });
afterAll(() => fs.rmSync(uploadDir, { recursive: true, force: true }));

let techUser: User;
let tech: supertest.Agent;
let otherTech: supertest.Agent;
let manager: supertest.Agent;
let openVisit: Visit;
let closedVisit: Visit;
let othersVisit: Visit;

async function makeVisit(technicianId: number, status: 'draft' | 'in_progress' | 'closed' = 'in_progress'): Promise<Visit> {
  const { press } = await makePress();
  const visit = await Visit.create({
    pressId: press.id,
    technicianId,
    controlFirmwareFound: null,
    monitorFirmwareFound: null,
    procedureId: null,
    bandSetId: null,
    firmwareRuleSetId: null,
    startedAt: null,
    closedAt: null,
  });
  if (status !== 'draft') await visit.update({ status: 'in_progress', startedAt: new Date() });
  if (status === 'closed') await visit.update({ status: 'closed', closedAt: new Date() });
  return visit;
}

const sessionUser = (u: User): SessionUser => ({ id: u.id, email: u.email, name: u.name, role: u.role });
const attachmentsOf = (visitId: number) => `/api/visits/${visitId}/attachments`;

/** Every file under the upload folder, relative to it. */
function storedFiles(): string[] {
  return (fs.readdirSync(uploadDir, { recursive: true }) as string[]).filter((p) => fs.statSync(path.join(uploadDir, p)).isFile()).sort();
}

/** Runs a refused upload and checks that it left no row and no file behind. */
async function expectNothingLeft(refused: () => Promise<supertest.Response>): Promise<supertest.Response> {
  const filesBefore = storedFiles();
  const rowsBefore = await Attachment.count();
  const res = await refused();
  expect(storedFiles()).toEqual(filesBefore);
  expect(await Attachment.count()).toBe(rowsBefore);
  return res;
}

beforeAll(async () => {
  techUser = await makeUser('technician');
  const otherTechUser = await makeUser('technician');
  tech = await signedInAgent(app(), techUser.email);
  otherTech = await signedInAgent(app(), otherTechUser.email);
  manager = await signedInAgent(app(), (await makeUser('manager')).email);
  openVisit = await makeVisit(techUser.id);
  closedVisit = await makeVisit(techUser.id, 'closed');
  othersVisit = await makeVisit(otherTechUser.id);
});

describe('uploading photos', () => {
  it('stores a camera photo upright, with its caption and step, without EXIF or GPS, and with a 320 px thumbnail', async () => {
    const res = await tech
      .post(attachmentsOf(openVisit.id))
      .field('stepId', 'inspect-connector')
      .field('caption', '  Sensor connector, pin 3 bent  ')
      .attach('photos', await cameraJpeg(800, 600), { filename: 'IMG_2001.png', contentType: 'image/png' });
    expect(res.status).toBe(201);
    expect(res.body.items).toHaveLength(1);
    const item = res.body.items[0];
    expect(item).toMatchObject({
      visitId: openVisit.id,
      kind: 'photo',
      stepId: 'inspect-connector',
      caption: 'Sensor connector, pin 3 bent',
      // The type comes from the bytes (a JPEG), not from the name or the declared type (PNG).
      mimeType: 'image/jpeg',
      width: 600,
      height: 800,
      url: `${attachmentsOf(openVisit.id)}/${item.id}/file`,
      thumbUrl: `${attachmentsOf(openVisit.id)}/${item.id}/thumb`,
    });
    expect(new Date(item.createdAt).getTime()).toBeGreaterThan(Date.now() - 60_000);

    const row = (await Attachment.findByPk(item.id))!;
    expect(row.storageKey).toMatch(new RegExp(`^visits/${openVisit.id}/[0-9a-f-]{36}\\.jpg$`));
    expect(row.storageKey).not.toContain('IMG_2001');
    const stored = fs.readFileSync(path.join(uploadDir, row.storageKey));
    expect(stored.length).toBe(item.bytes);
    const meta = await sharp(stored).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['jpeg', 600, 800]);
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect(stored.includes(TEST_CAMERA_MAKE)).toBe(false);
    expect(stored.includes('GPS')).toBe(false);

    const thumb = await sharp(fs.readFileSync(path.join(uploadDir, row.thumbKey!))).metadata();
    expect([thumb.format, thumb.width]).toEqual(['jpeg', 320]);
    expect(thumb.exif).toBeUndefined();
  });

  it('stores several photos of one step with one caption each, in the order sent', async () => {
    const res = await tech
      .post(attachmentsOf(openVisit.id))
      .field('stepId', 'measure-stator')
      .field('captions', JSON.stringify(['Meter on S1-S3', 'Meter on S2-S4', '']))
      .attach('photos', await plainJpeg(), 'a.jpg')
      .attach('photos', await pngWithAlpha(), 'b.png')
      .attach('photos', await webp(), 'c.webp');
    expect(res.status).toBe(201);
    expect(res.body.items.map((a: { caption: string | null; mimeType: string }) => [a.caption, a.mimeType])).toEqual([
      ['Meter on S1-S3', 'image/jpeg'],
      ['Meter on S2-S4', 'image/png'],
      [null, 'image/webp'],
    ]);
    const rows = await Attachment.findAll({ where: { id: res.body.items.map((a: { id: string }) => a.id) } });
    expect(rows.map((r) => r.storageKey.split('.').pop()).sort()).toEqual(['jpg', 'png', 'webp']);

    const list = await tech.get(attachmentsOf(openVisit.id)).query({ stepId: 'measure-stator' });
    expect(list.status).toBe(200);
    expect(list.body.items.map((a: { caption: string | null }) => a.caption)).toEqual(['Meter on S1-S3', 'Meter on S2-S4', null]);
  });

  it('answers a retried upload with the stored photo (200) and stores nothing twice', async () => {
    const id = randomUUID();
    const photo = await plainJpeg();
    const first = await tech.post(attachmentsOf(openVisit.id)).field('id', id).field('caption', 'Terminal strip').attach('photos', photo, 'strip.jpg');
    expect(first.status).toBe(201);
    expect(first.body.items[0].id).toBe(id);

    const filesAfterFirst = storedFiles();
    const retry = await tech.post(attachmentsOf(openVisit.id)).field('id', id).field('caption', 'Terminal strip').attach('photos', photo, 'strip.jpg');
    expect(retry.status).toBe(200);
    expect(retry.body.items).toEqual(first.body.items);
    expect(storedFiles()).toEqual(filesAfterFirst);
    expect(await Attachment.count({ where: { id } })).toBe(1);
  });

  it('stores only the new photos of a partly retried upload', async () => {
    const [stored, fresh] = [randomUUID(), randomUUID()];
    await tech.post(attachmentsOf(openVisit.id)).field('id', stored).attach('photos', await plainJpeg(), 'one.jpg').expect(201);
    const filesBefore = storedFiles().length;
    const res = await tech
      .post(attachmentsOf(openVisit.id))
      .field('ids', JSON.stringify([stored, fresh]))
      .attach('photos', await plainJpeg(), 'one.jpg')
      .attach('photos', await plainJpeg(), 'two.jpg');
    expect(res.status).toBe(201);
    expect(res.body.items.map((a: { id: string }) => a.id)).toEqual([stored, fresh]);
    expect(storedFiles().length).toBe(filesBefore + 2);
  });

  it('lets a manager add a photo to a technician’s visit', async () => {
    const res = await manager.post(attachmentsOf(openVisit.id)).attach('photos', await plainJpeg(), 'office.jpg');
    expect(res.status).toBe(201);
  });
});

describe('refused uploads leave nothing behind', () => {
  it('answers 400 when no photo arrives', async () => {
    const res = await expectNothingLeft(() => tech.post(attachmentsOf(openVisit.id)).field('caption', 'forgot the photo'));
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'no_file' });
    expect(res.body.error.message).toMatch(/No photo arrived.*"photos"/);
  });

  it('answers 413 for a photo larger than UPLOAD_MAX_BYTES', async () => {
    const big = await noisyJpeg(MAX_BYTES * 1.5);
    expect(big.length).toBeGreaterThan(MAX_BYTES);
    const res = await expectNothingLeft(async () =>
      tech
        .post(attachmentsOf(openVisit.id))
        .attach('photos', await plainJpeg(), 'small.jpg')
        .attach('photos', big, 'big.jpg'),
    );
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('file_too_large');
    expect(res.body.error.message).toMatch(/larger than 0\.4 MB.*Lower the camera resolution/);
  });

  it('answers 415 for text named .jpg and sent as image/jpeg', async () => {
    const res = await expectNothingLeft(() =>
      tech.post(attachmentsOf(openVisit.id)).attach('photos', Buffer.from('meter readings: 89.3 ohm'), { filename: 'readings.jpg', contentType: 'image/jpeg' }),
    );
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('not_an_image');
    expect(res.body.error.message).toMatch(/^The photo \(readings\.jpg\) is not a picture.*Nothing from this upload was stored\.$/);
  });

  it.each([
    ['GIF', 'anim.gif', gif],
    ['SVG', 'drawing.svg', async () => svg()],
  ])('answers 415 for a %s image', async (kind, filename, make) => {
    const bytes = await make();
    const res = await expectNothingLeft(() => tech.post(attachmentsOf(openVisit.id)).attach('photos', bytes, { filename, contentType: 'image/jpeg' }));
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('unsupported_image_type');
    expect(res.body.error.message).toContain(`is a ${kind} file; only JPEG, PNG and WebP photos are accepted`);
  });

  it('answers 415 for a HEIC photo and says how to get JPEG from the tablet', async () => {
    const res = await expectNothingLeft(() => tech.post(attachmentsOf(openVisit.id)).attach('photos', heicContainer(), { filename: 'IMG_0042.HEIC', contentType: 'image/heic' }));
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/HEIC photo.*Most Compatible/);
  });

  it('answers 400 for a JPEG that was cut off part way', async () => {
    const res = await expectNothingLeft(async () => tech.post(attachmentsOf(openVisit.id)).attach('photos', await truncatedJpeg(), 'cut.jpg'));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('image_damaged');
    expect(res.body.error.message).toMatch(/damaged or incomplete/);
  });

  it('stores none of several photos when one of them is refused', async () => {
    const res = await expectNothingLeft(async () =>
      tech
        .post(attachmentsOf(openVisit.id))
        .attach('photos', await plainJpeg(), 'good-1.jpg')
        .attach('photos', await gif(), 'bad.gif')
        .attach('photos', await plainJpeg(), 'good-2.jpg'),
    );
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/^Photo 2 of 3 \(bad\.gif\)/);
  });

  it('answers 400 for more than 6 photos in one upload', async () => {
    const photo = await plainJpeg(64, 48);
    const res = await expectNothingLeft(() => {
      let req = tech.post(attachmentsOf(openVisit.id));
      for (let i = 0; i < 7; i++) req = req.attach('photos', photo, `p${i}.jpg`);
      return req;
    });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('too_many_files');
    expect(res.body.error.message).toMatch(/At most 6 photos.*second upload/);
  });

  it('answers 400 for a caption longer than 300 characters, naming the field', async () => {
    const res = await expectNothingLeft(async () =>
      tech
        .post(attachmentsOf(openVisit.id))
        .field('caption', 'x'.repeat(301))
        .attach('photos', await plainJpeg(), 'p.jpg'),
    );
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ caption: 'A caption can be at most 300 characters; shorten it' });
  });

  it('answers 400 when captions do not match the photos one for one', async () => {
    const res = await expectNothingLeft(async () =>
      tech
        .post(attachmentsOf(openVisit.id))
        .field('captions', JSON.stringify(['only one']))
        .attach('photos', await plainJpeg(), 'a.jpg')
        .attach('photos', await plainJpeg(), 'b.jpg'),
    );
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('captions');
  });

  it('answers 400 for a file sent in another field than "photos"', async () => {
    const res = await expectNothingLeft(async () => tech.post(attachmentsOf(openVisit.id)).attach('photo', await plainJpeg(), 'a.jpg'));
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/send photos in the field "photos"/);
  });

  it('answers 400 for an unknown text field', async () => {
    const res = await expectNothingLeft(async () => tech.post(attachmentsOf(openVisit.id)).field('captionn', 'typo').attach('photos', await plainJpeg(), 'a.jpg'));
    expect(res.status).toBe(400);
    expect(Object.values(res.body.error.fields as Record<string, string>)[0]).toMatch(/Unknown field captionn/);
  });

  it('answers 409 for an upload to a closed visit', async () => {
    const res = await expectNothingLeft(async () => tech.post(attachmentsOf(closedVisit.id)).attach('photos', await plainJpeg(), 'late.jpg'));
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('visit_not_open');
  });

  it('answers 404 for an upload to another technician’s visit', async () => {
    const res = await expectNothingLeft(async () => otherTech.post(attachmentsOf(openVisit.id)).attach('photos', await plainJpeg(), 'x.jpg'));
    expect(res.status).toBe(404);
    expect(res.body.error.message).toMatch(/assigned to another technician/);
  });

  it('answers 401 for an upload without a session', async () => {
    const res = await expectNothingLeft(async () => anonymous(app()).post(attachmentsOf(openVisit.id)).attach('photos', await plainJpeg(), 'x.jpg'));
    expect(res.status).toBe(401);
  });

  it('answers 409 when a retry id already belongs to a photo of another visit', async () => {
    const id = randomUUID();
    await otherTech.post(attachmentsOf(othersVisit.id)).field('id', id).attach('photos', await plainJpeg(), 'x.jpg').expect(201);
    const res = await expectNothingLeft(async () => tech.post(attachmentsOf(openVisit.id)).field('id', id).attach('photos', await plainJpeg(), 'x.jpg'));
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('id_in_use');
  });
});

describe('storing is all or nothing', () => {
  /** Disk storage that fails on the nth put, or runs a hook before a put. */
  function flakyStorage(failOnPut: number, beforePut?: (n: number) => Promise<void>): FileStorage {
    const disk = new DiskStorage(uploadDir);
    let puts = 0;
    return {
      async put(key, data, mime) {
        puts += 1;
        await beforePut?.(puts);
        if (puts === failOnPut) throw new Error('disk full');
        return disk.put(key, data, mime);
      },
      get: (key) => disk.get(key),
      delete: (key) => disk.delete(key),
    };
  }

  it('removes the first photo’s files when storing the second fails', async () => {
    // Puts 1 and 2 are the first photo and its thumbnail; put 3 is the second photo.
    const service = createAttachmentService({ storage: flakyStorage(3), maxUploadBytes: MAX_BYTES });
    const files = [
      { bytes: await plainJpeg(), originalName: 'a.jpg' },
      { bytes: await plainJpeg(), originalName: 'b.jpg' },
    ];
    const filesBefore = storedFiles();
    const rowsBefore = await Attachment.count();
    await expect(service.uploadPhotos(sessionUser(techUser), openVisit.id, files, {})).rejects.toThrow('disk full');
    expect(storedFiles()).toEqual(filesBefore);
    expect(await Attachment.count()).toBe(rowsBefore);
  });

  it('removes the stored files when the visit is closed while the upload is being stored', async () => {
    const visit = await makeVisit(techUser.id);
    const closeOnFirstPut = async (n: number) => {
      if (n === 1) await Visit.update({ status: 'closed', closedAt: new Date() }, { where: { id: visit.id } });
    };
    const service = createAttachmentService({ storage: flakyStorage(0, closeOnFirstPut), maxUploadBytes: MAX_BYTES });
    const filesBefore = storedFiles();
    const err = await service.uploadPhotos(sessionUser(techUser), visit.id, [{ bytes: await plainJpeg(), originalName: 'a.jpg' }], {}).catch((e: unknown) => e);
    expect(err).toMatchObject({ status: 409, code: 'visit_not_open' });
    expect(storedFiles()).toEqual(filesBefore);
    expect(await Attachment.count({ where: { visitId: visit.id } })).toBe(0);
  });
  it('answers with the other try’s photo when two tries of one upload race, and keeps no second copy', async () => {
    const id = randomUUID();
    // The other try finishes its INSERT while this one is still writing files.
    const otherTryFinishes = async (n: number) => {
      if (n !== 1) return;
      const key = `visits/${openVisit.id}/${randomUUID()}`;
      await Attachment.create({ id, visitId: openVisit.id, kind: 'photo', stepId: null, caption: 'other try', storageKey: `${key}.jpg`, thumbKey: `${key}.thumb.jpg`, mimeType: 'image/jpeg', bytes: 1, width: 1, height: 1, createdBy: techUser.id });
    };
    const service = createAttachmentService({ storage: flakyStorage(0, otherTryFinishes), maxUploadBytes: MAX_BYTES });
    const filesBefore = storedFiles();
    const result = await service.uploadPhotos(sessionUser(techUser), openVisit.id, [{ bytes: await plainJpeg(), originalName: 'a.jpg' }], { id });
    expect(result.created).toBe(false);
    expect(result.items.map((a) => [a.id, a.caption])).toEqual([[id, 'other try']]);
    expect(storedFiles()).toEqual(filesBefore);
    expect(await Attachment.count({ where: { id } })).toBe(1);
  });
});

describe('reading photos back', () => {
  let photoId: string;
  let storedBytes: Buffer;

  beforeAll(async () => {
    const res = await tech.post(attachmentsOf(openVisit.id)).field('caption', 'Resolver nameplate').attach('photos', await cameraJpeg(800, 600), 'plate.jpg');
    photoId = res.body.items[0].id;
    storedBytes = fs.readFileSync(path.join(uploadDir, (await Attachment.findByPk(photoId))!.storageKey));
  });

  it('streams the stored photo with its type, privately cached and not sniffable', async () => {
    const res = await tech.get(`${attachmentsOf(openVisit.id)}/${photoId}/file`).buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('image/jpeg');
    expect(res.headers['cache-control']).toMatch(/^private/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.compare(res.body as Buffer, storedBytes)).toBe(0);
  });

  it('streams the thumbnail as a JPEG 320 pixels wide', async () => {
    const res = await tech.get(`${attachmentsOf(openVisit.id)}/${photoId}/thumb`).buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('image/jpeg');
    expect((await sharp(res.body as Buffer).metadata()).width).toBe(320);
  });

  it('lists the visit’s photos for the technician and for the office, not for another technician', async () => {
    const mine = await tech.get(attachmentsOf(openVisit.id));
    expect(mine.status).toBe(200);
    expect(mine.body.items.map((a: { id: string }) => a.id)).toContain(photoId);
    expect((await manager.get(attachmentsOf(openVisit.id))).body.items).toHaveLength(mine.body.items.length);
    expect((await otherTech.get(attachmentsOf(openVisit.id))).status).toBe(404);
    expect((await otherTech.get(`${attachmentsOf(openVisit.id)}/${photoId}/file`)).status).toBe(404);
  });

  it('answers 404 for a photo asked for under another visit', async () => {
    const res = await otherTech.get(`${attachmentsOf(othersVisit.id)}/${photoId}/file`);
    expect(res.status).toBe(404);
  });

  it('still serves the photos of a closed visit', async () => {
    const visit = await makeVisit(techUser.id);
    const up = await tech.post(attachmentsOf(visit.id)).attach('photos', await plainJpeg(), 'a.jpg');
    await visit.update({ status: 'closed', closedAt: new Date() });
    const res = await manager.get(`${attachmentsOf(visit.id)}/${up.body.items[0].id}/thumb`);
    expect(res.status).toBe(200);
  });
});

describe('deleting photos', () => {
  let visit: Visit;
  beforeEach(async () => {
    visit = await makeVisit(techUser.id);
  });

  it('removes the photo and both of its files while the visit is open', async () => {
    const up = await tech.post(attachmentsOf(visit.id)).attach('photos', await plainJpeg(), 'a.jpg');
    const row = (await Attachment.findByPk(up.body.items[0].id))!;
    expect(fs.existsSync(path.join(uploadDir, row.storageKey))).toBe(true);
    const res = await tech.delete(`${attachmentsOf(visit.id)}/${row.id}`);
    expect(res.status).toBe(204);
    expect(await Attachment.findByPk(row.id)).toBeNull();
    expect(fs.existsSync(path.join(uploadDir, row.storageKey))).toBe(false);
    expect(fs.existsSync(path.join(uploadDir, row.thumbKey!))).toBe(false);
    expect((await tech.get(`${attachmentsOf(visit.id)}/${row.id}/file`)).status).toBe(404);
  });

  it('keeps the photo of a closed visit (409)', async () => {
    const up = await tech.post(attachmentsOf(visit.id)).attach('photos', await plainJpeg(), 'a.jpg');
    await visit.update({ status: 'closed', closedAt: new Date() });
    const res = await tech.delete(`${attachmentsOf(visit.id)}/${up.body.items[0].id}`);
    expect(res.status).toBe(409);
    const row = (await Attachment.findByPk(up.body.items[0].id))!;
    expect(fs.existsSync(path.join(uploadDir, row.storageKey))).toBe(true);
  });

  it('does not let another technician delete the photo (404)', async () => {
    const up = await tech.post(attachmentsOf(visit.id)).attach('photos', await plainJpeg(), 'a.jpg');
    expect((await otherTech.delete(`${attachmentsOf(visit.id)}/${up.body.items[0].id}`)).status).toBe(404);
    expect(await Attachment.findByPk(up.body.items[0].id)).not.toBeNull();
  });
});

describe('storeSignature', () => {
  it('stores the customer’s PNG signature as a signature attachment of the visit', async () => {
    const visit = await makeVisit(techUser.id);
    const png = await pngWithAlpha(600, 200);
    const signature = await storeSignature(sessionUser(techUser), visit.id, png);
    expect(signature).toMatchObject({ kind: 'signature', mimeType: 'image/png', width: 600, height: 200, caption: null, stepId: null });
    const row = (await Attachment.findByPk(signature.id))!;
    expect((await sharp(fs.readFileSync(path.join(uploadDir, row.storageKey))).metadata()).format).toBe('png');
    const listed = await tech.get(attachmentsOf(visit.id)).query({ kind: 'signature' });
    expect(listed.body.items.map((a: { id: string }) => a.id)).toEqual([signature.id]);
    // A signature is kept: it is replaced by signing again, not deleted.
    expect((await tech.delete(`${attachmentsOf(visit.id)}/${signature.id}`)).status).toBe(409);
  });

  it('refuses a signature that is not a PNG, and stores nothing', async () => {
    const visit = await makeVisit(techUser.id);
    const filesBefore = storedFiles();
    const err = await storeSignature(sessionUser(techUser), visit.id, await plainJpeg()).catch((e: unknown) => e);
    expect(err).toMatchObject({ status: 415, message: 'The signature is JPEG; only PNG is accepted here.' });
    expect(storedFiles()).toEqual(filesBefore);
    expect(await Attachment.count({ where: { visitId: visit.id } })).toBe(0);
  });

  it('refuses a signature on a closed visit', async () => {
    await expect(storeSignature(sessionUser(techUser), closedVisit.id, await pngWithAlpha())).rejects.toMatchObject({ status: 409 });
  });
});
