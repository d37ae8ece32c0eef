import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { photos } from '@fuelwright/db';
import type { CaseDto } from '@fuelwright/shared';
import { createTestApp, demoUser, flushMail, linkToken, shareAndAccept, signedIn, type TestApp } from './test-app.js';

type Agent = Awaited<ReturnType<typeof signedIn>>;

/** A small JPEG carrying a camera tag and a GPS position, as phone photos do. */
async function jpegWithLocation(): Promise<Buffer> {
  return sharp({ create: { width: 120, height: 80, channels: 3, background: '#b07030' } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'PhoneCam', Software: 'camera app' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' },
    })
    .toBuffer();
}

describe('photos of a case', () => {
  let t: TestApp;
  let racer: Agent;
  let coach: Agent;
  let c: CaseDto;
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    coach = await signedIn(t, demoUser('coach'));
    const kartId = (await racer.get('/api/karts')).body.karts[0].id;
    c = (await racer.post('/api/cases').send({ kartId, symptoms: ['bog-on-acceleration'] })).body;
  });
  afterAll(() => t.close());

  it('stores an upload without its location and camera tags, with a thumbnail', async () => {
    const original = await jpegWithLocation();
    expect((await sharp(original).metadata()).exif).toBeDefined();
    const res = await racer.post(`/api/cases/${c.id}/photos`).attach('file', original, { filename: 'foam.jpg', contentType: 'image/jpeg' }).field('caption', 'Foam, out of the bowl');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ contentType: 'image/jpeg', width: 120, height: 80, caption: 'Foam, out of the bowl', uploaderName: 'Tamsin Vell' });
    const stored = await racer.get(res.body.url).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (d: Buffer) => chunks.push(d));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(stored.status).toBe(200);
    expect(stored.headers['content-type']).toMatch(/image\/jpeg/);
    const meta = await sharp(stored.body as Buffer).metadata();
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect((stored.body as Buffer).includes(Buffer.from('PhoneCam'))).toBe(false);
    const thumb = await racer.get(res.body.thumbUrl);
    expect(thumb.status).toBe(200);
    expect(thumb.headers['content-type']).toMatch(/image\/webp/);
  });

  it('refuses a file whose content is not a picture, whatever its name says, storing nothing', async () => {
    const before = (await t.db.db.select().from(photos)).length;
    const fake = await racer.post(`/api/cases/${c.id}/photos`).attach('file', Buffer.from('#!/bin/sh\necho not a photo\n'), { filename: 'photo.jpg', contentType: 'image/jpeg' });
    expect(fake.status).toBe(415);
    expect(fake.body.fields.file[0]).toMatch(/JPEG, PNG and WebP/);
    const gif = await racer.post(`/api/cases/${c.id}/photos`).attach('file', Buffer.from('GIF89a\x01\x00\x01\x00'), { filename: 'x.png', contentType: 'image/png' });
    expect(gif.status).toBe(415);
    const missing = await racer.post(`/api/cases/${c.id}/photos`).field('caption', 'no file');
    expect(missing.status).toBe(400);
    expect(missing.body.fields.file).toBeDefined();
    expect((await t.db.db.select().from(photos)).length).toBe(before);
  });

  it('refuses a photo over 15 MB with 413', async () => {
    const big = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff]), Buffer.alloc(15 * 1024 * 1024 + 10)]);
    const res = await racer.post(`/api/cases/${c.id}/photos`).attach('file', big, { filename: 'big.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(413);
    expect(res.body.fields.file[0]).toMatch(/at most 15 MB/);
  });

  it('lets only people who can see the case list or fetch its photos', async () => {
    const list = (await racer.get(`/api/cases/${c.id}/photos`)).body.photos;
    expect(list).toHaveLength(1);
    expect((await coach.get(`/api/cases/${c.id}/photos`)).status).toBe(404);
    expect((await coach.get(list[0].url)).status).toBe(404);
    expect((await t.http.get(list[0].url)).status).toBe(401);
    // Once shared, the coach sees it and may answer with a photo too.
    await shareAndAccept(t, racer, coach, 'coach@fuelwright.test', { scope: 'case', caseId: c.id });
    expect((await coach.get(list[0].url)).status).toBe(200);
  });

  it('answers a photo request with an upload', async () => {
    const reqd = (await coach.post(`/api/cases/${c.id}/photo-requests`).send({ what: 'The splash plate' })).body;
    const png = await sharp({ create: { width: 40, height: 40, channels: 4, background: '#808080ff' } }).png().toBuffer();
    const res = await racer.post(`/api/cases/${c.id}/photos`).attach('file', png, { filename: 'plate', contentType: 'application/octet-stream' }).field('photoRequestId', reqd.id);
    expect(res.status).toBe(201);
    expect(res.body.contentType).toBe('image/png');
    const requests = (await coach.get(`/api/cases/${c.id}/photo-requests`)).body.requests;
    expect(requests[0].fulfilledByPhotoId).toBe(res.body.id);
  });
});

describe('e-mail about a new photo', () => {
  let t: TestApp;
  let racer: Agent;
  let coach: Agent;
  let c: CaseDto;
  let other: CaseDto;
  const png = () => sharp({ create: { width: 40, height: 40, channels: 3, background: '#606060' } }).png().toBuffer();
  const share = (caseId: string) => shareAndAccept(t, racer, coach, 'coach@fuelwright.test', { scope: 'case', caseId });
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    coach = await signedIn(t, demoUser('coach'));
    const kartId = (await racer.get('/api/karts')).body.karts[0].id;
    c = (await racer.post('/api/cases').send({ kartId, symptoms: ['bog-on-acceleration'] })).body;
    other = (await racer.post('/api/cases').send({ kartId, symptoms: ['hesitation'] })).body;
    await share(c.id);
    await share(other.id);
  });
  afterAll(() => t.close());

  it('tells the coach who asked for the photo, with a link to the case, and moves the case up the dashboard', async () => {
    const dashboard = async () => ((await coach.get('/api/shared-cases')).body.cases as { id: string }[]).map((x) => x.id).filter((id) => id === c.id || id === other.id);
    expect(await dashboard()).toEqual([other.id, c.id]);
    const asked = (await coach.post(`/api/cases/${c.id}/photo-requests`).send({ what: 'The foam filter, dry' })).body;
    const before = (await flushMail(t)).length;
    const res = await racer.post(`/api/cases/${c.id}/photos`).attach('file', await png(), { filename: 'foam.png', contentType: 'image/png' }).field('photoRequestId', asked.id).field('caption', 'Foam <dry>');
    expect(res.status).toBe(201);
    const mails = (await flushMail(t)).slice(before);
    expect(mails.map((m) => m.to)).toEqual([['coach@fuelwright.test']]);
    const [m] = mails;
    expect(m.headers['x-fuelwright-kind']).toBe('photo-added');
    expect(m.subject).toBe('Tamsin Vell sent the photo you asked for on "' + c.kartName + '"');
    expect(m.text).toContain('answered your request for a photo of: The foam filter, dry');
    expect(m.text).toContain('Caption: Foam <dry>');
    expect(m.text).toContain(`Open the case: http://fuelwright.test/cases/${c.id}`);
    expect(m.text).toMatch(/Stop these e-mails: http:\/\/fuelwright\.test\/unsubscribe\?token=/);
    expect(m.html).toContain('Caption: Foam &lt;dry&gt;');
    expect(m.html).toContain(`href="http://fuelwright.test/cases/${c.id}"`);
    expect(await dashboard()).toEqual([c.id, other.id]);
  });

  it('tells the racer when the coach adds a photo, and not the coach who added it', async () => {
    const before = (await flushMail(t)).length;
    expect((await coach.post(`/api/cases/${other.id}/photos`).attach('file', await png(), { filename: 'x.png', contentType: 'image/png' })).status).toBe(201);
    const mails = (await flushMail(t)).slice(before);
    expect(mails.map((m) => m.to)).toEqual([['racer@fuelwright.test']]);
    expect(mails[0].subject).toBe(`Marit Quayle added a photo to the case of "${other.kartName}"`);
  });

  it('follows the per-user setting and the unsubscribe link for photo notices', async () => {
    let before = (await flushMail(t)).length;
    await racer.post(`/api/cases/${c.id}/photos`).attach('file', await png(), { filename: 'x.png', contentType: 'image/png' });
    const notice = (await flushMail(t)).slice(before)[0];
    const token = decodeURIComponent(linkToken(notice, '/unsubscribe?token='));
    expect((await t.http.post('/api/notifications/unsubscribe').send({ token })).body).toEqual({ kind: 'photo-added' });
    expect((await coach.get('/api/me/notifications')).body.notices).toEqual({ 'photo-added': false });
    before = (await flushMail(t)).length;
    expect((await racer.post(`/api/cases/${c.id}/photos`).attach('file', await png(), { filename: 'x.png', contentType: 'image/png' })).status).toBe(201);
    expect((await flushMail(t)).length).toBe(before);
    expect((await coach.put('/api/me/notifications').send({ 'photo-added': true })).body.notices).toEqual({ 'photo-added': true });
    await racer.post(`/api/cases/${c.id}/photos`).attach('file', await png(), { filename: 'x.png', contentType: 'image/png' });
    expect((await flushMail(t)).length).toBe(before + 1);
    expect((await coach.put('/api/me/notifications').send({ 'photo-added': 'off' })).body.fields['photo-added']).toBeDefined();
  });
});

describe('a coach’s photo and the per-case limit', () => {
  let t: TestApp;
  let racer: Agent;
  let coach: Agent;
  let c: CaseDto;
  const png = (shade: string) => sharp({ create: { width: 24, height: 24, channels: 3, background: shade } }).png().toBuffer();
  beforeAll(async () => {
    t = await createTestApp();
    racer = await signedIn(t, demoUser('racer'));
    coach = await signedIn(t, demoUser('coach'));
    const kartId = (await racer.get('/api/karts')).body.karts[0].id;
    c = (await racer.post('/api/cases').send({ kartId, symptoms: ['bog-on-acceleration'] })).body;
    await shareAndAccept(t, racer, coach, 'coach@fuelwright.test', { scope: 'case', caseId: c.id });
  });
  afterAll(() => t.close());

  it('takes a photo from the coach the case is shared with; the racer sees it, by the coach, and can open it', async () => {
    const res = await coach.post(`/api/cases/${c.id}/photos`).attach('file', await png('#405060'), { filename: 'reference.png', contentType: 'image/png' }).field('caption', 'What a good plate looks like');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ uploaderName: 'Marit Quayle', caption: 'What a good plate looks like' });
    const listed = (await racer.get(`/api/cases/${c.id}/photos`)).body.photos;
    expect(listed).toEqual([expect.objectContaining({ id: res.body.id, uploaderName: 'Marit Quayle' })]);
    expect((await racer.get(listed[0].url)).status).toBe(200);
    // Someone the case is not shared with cannot add one.
    const shop = await signedIn(t, demoUser('shop'));
    expect((await shop.post(`/api/cases/${c.id}/photos`).attach('file', await png('#405060'), { filename: 'x.png', contentType: 'image/png' })).status).toBe(404);
  });

  it('holds at most 30 photos per case and refuses the 31st, storing nothing', async () => {
    let held = (await racer.get(`/api/cases/${c.id}/photos`)).body.photos.length;
    while (held < 30) {
      const res = await racer.post(`/api/cases/${c.id}/photos`).attach('file', await png('#706050'), { filename: `p${held}.png`, contentType: 'image/png' });
      expect(res.status).toBe(201);
      held++;
    }
    const before = (await t.db.db.select().from(photos)).length;
    const over = await coach.post(`/api/cases/${c.id}/photos`).attach('file', await png('#706050'), { filename: 'one-more.png', contentType: 'image/png' });
    expect(over.status).toBe(400);
    expect(over.body.message).toMatch(/at most 30 photos/);
    expect(over.body.fields.file[0]).toMatch(/at most 30 photos/);
    expect((await t.db.db.select().from(photos)).length).toBe(before);
    expect((await racer.get(`/api/cases/${c.id}/photos`)).body.photos).toHaveLength(30);
  });
});
