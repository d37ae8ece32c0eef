import { randomUUID } from 'node:crypto';
import { HttpException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { and, asc, count, eq, isNull } from 'drizzle-orm';
import { cases, photoRequests, photos, users, type Db } from '@fuelwright/db';
import type { PhotoDto } from '@fuelwright/shared';
import { DB } from '../database/database.tokens.js';
import { AccessPolicy } from '../common/access/access-policy.js';
import { FieldsBadRequest } from '../common/validation.js';
import type { SessionUser } from '../common/session-user.js';
import { CaseStore } from '../cases/case-store.js';
import { CaseRanking } from '../cases/case-ranking.js';
import { CaseAudience, type Recipient } from '../cases/case-audience.js';
import type { AppConfig } from '../config/app.config.js';
import { MailService } from '../mail/mail.service.js';
import { PhotoRejected, PHOTOS_PER_CASE, processPhoto } from './image-processing.js';
import { PhotoStorage } from './photo-storage.js';

export interface UploadedFile {
  buffer: Buffer;
  size: number;
  originalname: string;
  mimetype: string;
}

export interface UploadMeta {
  checkId?: string;
  caption?: string;
  photoRequestId?: string;
}

/** Who hears about a new photo: the one who asked for it first, then everyone else who can see the case. */
function orderRecipients(to: Recipient[], requestedBy: string | null | undefined): Recipient[] {
  return [...to].sort((a, b) => Number(b.id === requestedBy) - Number(a.id === requestedBy));
}

@Injectable()
export class PhotosService {
  private readonly publicUrl: string;

  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly storage: PhotoStorage,
    private readonly store: CaseStore,
    private readonly ranking: CaseRanking,
    private readonly access: AccessPolicy,
    private readonly audience: CaseAudience,
    private readonly mail: MailService,
    config: ConfigService,
  ) {
    this.publicUrl = config.getOrThrow<AppConfig>('app').publicUrl;
  }

  private async caseFor(user: SessionUser, caseId: string, action: 'view' | 'comment') {
    const loaded = await this.store.load(caseId);
    await this.access.requireCase(user, loaded && { ownerId: loaded.row.ownerId }, { caseId, kartId: loaded?.row.kartId ?? '' }, action);
    return loaded!;
  }

  /** Racers and the coaches or shops they shared with attach photos; nothing is stored when anything is wrong. */
  async upload(user: SessionUser, caseId: string, file: UploadedFile | undefined, meta: UploadMeta): Promise<PhotoDto> {
    const c = await this.caseFor(user, caseId, 'comment');
    if (!file) throw new FieldsBadRequest({ file: ['file must be a photo (JPEG, PNG or WebP), sent as multipart form data'] });
    if (meta.checkId && !this.ranking.checkLabel(meta.checkId, c.row.rulesetVersion)) throw new FieldsBadRequest({ checkId: [`unknown check "${meta.checkId}"`] });
    if (meta.caption && meta.caption.length > 300) throw new FieldsBadRequest({ caption: ['caption must be at most 300 characters'] });
    let request: { what: string; requestedBy: string | null } | undefined;
    if (meta.photoRequestId) {
      [request] = await this.db.select().from(photoRequests).where(and(eq(photoRequests.id, meta.photoRequestId), eq(photoRequests.caseId, caseId)));
      if (!request) throw new FieldsBadRequest({ photoRequestId: ['no such photo request on this case'] });
    }
    const [{ n }] = await this.db.select({ n: count() }).from(photos).where(eq(photos.caseId, caseId));
    if (n >= PHOTOS_PER_CASE) throw new FieldsBadRequest({ file: [`a case holds at most ${PHOTOS_PER_CASE} photos`] }, `A case holds at most ${PHOTOS_PER_CASE} photos.`);
    let processed;
    try {
      processed = await processPhoto(file.buffer);
    } catch (e) {
      if (e instanceof PhotoRejected) throw new HttpException({ message: e.message, fields: { file: [e.message] } }, e.status);
      throw e;
    }
    const to = await this.audience.of({ caseId, kartId: c.row.kartId, ownerId: c.row.ownerId }, user.id);
    const id = randomUUID();
    const objectKey = `cases/${caseId}/${id}.${processed.format === 'jpeg' ? 'jpg' : processed.format}`;
    const thumbKey = `cases/${caseId}/${id}.thumb.webp`;
    await this.storage.put(objectKey, processed.body, processed.contentType);
    await this.storage.put(thumbKey, processed.thumb, 'image/webp');
    try {
      await this.db.transaction(async (tx) => {
        await tx.insert(photos).values({
          id,
          caseId,
          checkId: meta.checkId ?? null,
          uploaderId: user.id,
          objectKey,
          thumbKey,
          contentType: processed.contentType,
          bytes: processed.body.length,
          width: processed.width,
          height: processed.height,
          caption: meta.caption?.trim() ?? '',
        });
        if (meta.photoRequestId) {
          await tx
            .update(photoRequests)
            .set({ fulfilledByPhotoId: id })
            .where(and(eq(photoRequests.id, meta.photoRequestId), isNull(photoRequests.fulfilledByPhotoId)));
        }
        // A new photo is a change: the coach's dashboard (newest change first) moves the case up.
        await tx.update(cases).set({ updatedAt: new Date() }).where(eq(cases.id, caseId));
        const caption = meta.caption?.trim() ?? '';
        for (const r of orderRecipients(to, request?.requestedBy)) {
          const answers = request && r.id === request.requestedBy;
          await this.mail.enqueue(tx, {
            kind: 'photo-added',
            toEmail: r.email,
            toUserId: r.id,
            content: {
              subject: answers ? `${user.displayName} sent the photo you asked for on "${c.kartName}"` : `${user.displayName} added a photo to the case of "${c.kartName}"`,
              paragraphs: [
                answers ? `${user.displayName} answered your request for a photo of: ${request!.what}` : `${user.displayName} added a photo to the case of "${c.kartName}".`,
                ...(caption ? [`Caption: ${caption}`] : []),
                'The photo itself is not attached: open the case to see it (you need to be signed in).',
              ],
              action: { label: 'Open the case', url: `${this.publicUrl}/cases/${caseId}` },
            },
          });
        }
      });
    } catch (e) {
      // The row did not land: take the objects back out so nothing is left half-stored.
      await Promise.allSettled([this.storage.delete(objectKey), this.storage.delete(thumbKey)]);
      throw e;
    }
    return (await this.list(user, caseId)).find((p) => p.id === id)!;
  }

  async list(user: SessionUser, caseId: string): Promise<PhotoDto[]> {
    await this.caseFor(user, caseId, 'view');
    const rows = await this.db
      .select({ p: photos, name: users.displayName })
      .from(photos)
      .leftJoin(users, eq(users.id, photos.uploaderId))
      .where(eq(photos.caseId, caseId))
      .orderBy(asc(photos.createdAt));
    return rows.map(({ p, name }) => ({
      id: p.id,
      caseId,
      checkId: p.checkId,
      uploaderName: name ?? 'A removed account',
      contentType: p.contentType,
      bytes: p.bytes,
      width: p.width,
      height: p.height,
      caption: p.caption,
      createdAt: p.createdAt.toISOString(),
      url: `/api/photos/${p.id}`,
      thumbUrl: `/api/photos/${p.id}/thumb`,
    }));
  }

  /** The bytes of a photo, for someone who may see its case (404 otherwise). */
  async download(user: SessionUser, photoId: string, thumb: boolean): Promise<{ body: Buffer; contentType: string }> {
    const [p] = await this.db.select().from(photos).where(eq(photos.id, photoId));
    if (!p) throw new NotFoundException('No such photo.');
    await this.caseFor(user, p.caseId, 'view').catch(() => {
      throw new NotFoundException('No such photo.');
    });
    return thumb ? { body: await this.storage.get(p.thumbKey), contentType: 'image/webp' } : { body: await this.storage.get(p.objectKey), contentType: p.contentType };
  }
}
