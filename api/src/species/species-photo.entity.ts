import type { PhotoLicence } from '@homeground/shared';
import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

@Entity({ name: 'species_photos' })
export class SpeciesPhoto {
  @PrimaryColumn({ type: 'text' })
  slug: string;

  /** File name under DATA_DIR/photos. */
  @Column({ type: 'text' })
  file: string;

  @Column({ type: 'text' })
  mime: string;

  @Column({ type: 'integer' })
  bytes: number;

  @Column({ type: 'integer' })
  width: number;

  @Column({ type: 'integer' })
  height: number;

  /** Who took the photo; null only for uploads from before credits were asked for. */
  @Column({ type: 'text', nullable: true })
  photographer: string | null;

  @Column({ type: 'text', nullable: true })
  licence: PhotoLicence | null;

  @Column({ type: 'text', name: 'source_url', nullable: true })
  sourceUrl: string | null;

  @Column({ type: 'text', name: 'uploaded_by', nullable: true })
  uploadedBy: string | null;

  @CreateDateColumn({ name: 'uploaded_at' })
  uploadedAt: Date;
}
