import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

/** Uploaded bytes, named by their SHA-256 (sync/SPEC.md S25, S26): stored once. */
@Entity('attachments')
export class Attachment {
  @PrimaryColumn({ type: 'varchar', length: 64 })
  sha256: string;

  @Column({ type: 'integer' })
  size: number;

  @Column({ type: 'varchar', length: 50 })
  mimeType: string;

  @Column({ type: 'blob' })
  data: Buffer;

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
