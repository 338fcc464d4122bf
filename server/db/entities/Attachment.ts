import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

/**
 * A board photo uploaded from a device, named by the SHA-256 of the bytes it sent (sync/SPEC.md
 * S25, S26), stored once, through the photo pipeline: the re-encoded image and its thumbnail
 * are in the PhotoStore under `${sha256}/full` and `${sha256}/thumb`; size and type are theirs.
 */
@Entity('attachments')
export class Attachment {
  @PrimaryColumn({ type: 'varchar', length: 64 })
  sha256: string;

  @Column({ type: 'integer' })
  size: number;

  @Column({ type: 'varchar', length: 50 })
  mimeType: string;

  /** Only rows from before the pipeline: the bytes as sent, re-encoded on first use (then null). */
  @Column({ type: 'blob', nullable: true })
  data: Buffer | null;

  /** Null only while `data` still waits for the pipeline. */
  @Column({ type: 'integer', nullable: true })
  width: number | null;

  @Column({ type: 'integer', nullable: true })
  height: number | null;

  @CreateDateColumn({ type: 'datetime' })
  createdAt: Date;
}

/** Who uploaded which bytes: an uploader may always read them back (S27). */
@Entity('attachment_uploaders')
export class AttachmentUploader {
  @PrimaryColumn({ type: 'varchar', length: 64 })
  sha256: string;

  @PrimaryColumn({ type: 'varchar', length: 36 })
  userId: string;
}
