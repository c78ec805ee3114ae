import { existsSync, mkdirSync } from 'node:fs';
import { rename, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { Inject, Injectable, NotFoundException, UnsupportedMediaTypeException } from '@nestjs/common';
import { PHOTO_WIDTHS, type PhotoCredit, type WordLocale } from '@homeground/shared';
import { apiWords } from '../common/i18n/api-i18n.js';
import { InjectDataSource } from '@nestjs/typeorm';
import { fileTypeFromBuffer } from 'file-type';
import sharp, { type Metadata } from 'sharp';
import { DataSource } from 'typeorm';
import { TooLargeWithReason } from '../common/http/too-large-with-reason.js';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { SpeciesPhoto } from './species-photo.entity.js';
import { SpeciesStore } from './species-store.service.js';

export const MAX_PHOTO_BYTES = 5 * 1024 * 1024;
/** A small file can still unpack to a huge image; 40 megapixels is more than any camera photo we show needs. */
export const MAX_PHOTO_PIXELS = 40_000_000;
const ACCEPTED = new Map([
  ['image/jpeg', 'jpg'],
  ['image/png', 'png'],
  ['image/webp', 'webp'],
]);

export interface PhotoFile {
  path: string;
  mime: string;
}

@Injectable()
export class SpeciesPhotosService {
  private readonly dir: string;

  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly store: SpeciesStore,
    @Inject(APP_CONFIG) config: AppConfig,
  ) {
    this.dir = config.photosDir;
  }

  /** Stores a photo after checking its real type from its bytes (the name and the browser's word are not trusted). */
  async save(
    slug: string,
    bytes: Buffer,
    credit: PhotoCredit,
    userId: string,
    locale: WordLocale = 'en',
  ): Promise<SpeciesPhoto> {
    if (!this.store.get(slug)) throw new NotFoundException(apiWords(locale)('refusals.species.noSpecies', { slug }));
    const type = await fileTypeFromBuffer(bytes);
    const ext = type && ACCEPTED.get(type.mime);
    const say = apiWords(locale);
    if (!type || !ext) {
      throw new UnsupportedMediaTypeException(
        type ? say('refusals.species.photoType', { mime: type.mime }) : say('refusals.species.photoUnknownType'),
      );
    }
    let meta: Metadata;
    try {
      meta = await sharp(bytes).metadata();
    } catch {
      throw new UnsupportedMediaTypeException(say('refusals.species.photoUnreadable'));
    }
    const pixels = (meta.width ?? 0) * (meta.height ?? 0);
    if (pixels > MAX_PHOTO_PIXELS) {
      throw new TooLargeWithReason(
        say('refusals.species.photoTooLarge', {
          width: meta.width,
          height: meta.height,
          megapixels: MAX_PHOTO_PIXELS / 1_000_000,
        }),
      );
    }
    mkdirSync(this.dir, { recursive: true });
    const file = `${slug}.${ext}`;
    const tmp = path.join(this.dir, `.${file}.${process.pid}.tmp`);
    await writeFile(tmp, bytes);
    const photo = await this.db.transaction(async (tx) => {
      const old = await tx.findOne(SpeciesPhoto, { where: { slug } });
      const saved = await tx.save(
        SpeciesPhoto,
        tx.create(SpeciesPhoto, {
          slug,
          file,
          mime: type.mime,
          bytes: bytes.length,
          width: meta.width ?? 0,
          height: meta.height ?? 0,
          photographer: credit.photographer,
          licence: credit.licence,
          sourceUrl: credit.sourceUrl,
          uploadedBy: userId,
        }),
      );
      await rename(tmp, path.join(this.dir, file));
      await this.removeVariants(slug, old && old.file !== file ? old.file : null);
      await this.makeVariants(slug, bytes, meta.width ?? 0);
      return saved;
    });
    await this.store.publish();
    return photo;
  }

  /** The photo file to send, resized to one of PHOTO_WIDTHS (cached on disk) or as stored. */
  async file(slug: string, width?: number, locale: WordLocale = 'en'): Promise<PhotoFile> {
    const photo = await this.db.getRepository(SpeciesPhoto).findOne({ where: { slug } });
    if (!photo) throw new NotFoundException(apiWords(locale)('refusals.species.noPhoto', { slug }));
    const original = path.join(this.dir, photo.file);
    if (!width || width >= photo.width) return { path: original, mime: photo.mime };
    const resized = path.join(this.dir, `${slug}-w${width}.webp`);
    if (!existsSync(resized)) await sharp(original).resize({ width }).webp({ quality: 80 }).toFile(resized);
    return { path: resized, mime: 'image/webp' };
  }

  /**
   * The sizes the list, printed fact cards and the species page show (PHOTO_SIZES), made at upload so
   * the first reader waits for none; a photo narrower than a size is served as stored instead.
   */
  private async makeVariants(slug: string, bytes: Buffer, width: number): Promise<void> {
    for (const w of PHOTO_WIDTHS) {
      if (w >= width) continue;
      await sharp(bytes)
        .resize({ width: w })
        .webp({ quality: 80 })
        .toFile(path.join(this.dir, `${slug}-w${w}.webp`));
    }
  }

  private async removeVariants(slug: string, oldFile: string | null): Promise<void> {
    const doomed = PHOTO_WIDTHS.map((w) => path.join(this.dir, `${slug}-w${w}.webp`));
    if (oldFile) doomed.push(path.join(this.dir, oldFile));
    await Promise.all(doomed.map((f) => rm(f, { force: true })));
  }
}
