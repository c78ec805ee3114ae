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

  @Column({ type: 'text', name: 'uploaded_by', nullable: true })
  uploadedBy: string | null;

  @CreateDateColumn({ name: 'uploaded_at' })
  uploadedAt: Date;
}
