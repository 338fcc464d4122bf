import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import type { CableCell, CableSweep, KhResultJson, RunDiagram, RunKind, RunStatus } from '@/shared/api/runs';

/**
 * A heavy computation (server/runs). `diagramKey` names the diagram up to relabelling (with
 * the unknots and, for reduced runs, the marked component), so an identical request reuses a
 * stored result; a cable sweep's cells are runs with `parentRunId` set.
 */
@Entity('runs')
export class Run {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 20 })
  kind: RunKind;

  @Index()
  @Column({ type: 'varchar', length: 20 })
  status: RunStatus;

  @Column({ type: 'varchar', length: 120 })
  label: string;

  @Index()
  @Column({ type: 'varchar', length: 100, nullable: true })
  sketchId: string | null;

  @Index()
  @Column({ type: 'varchar', length: 36, nullable: true })
  groupId: string | null;

  @Index()
  @Column({ type: 'varchar', length: 36 })
  startedBy: string;

  @Index()
  @Column({ type: 'varchar', length: 36, nullable: true })
  parentRunId: string | null;

  @Column({ type: 'simple-json' })
  diagram: RunDiagram;

  @Index()
  @Column({ type: 'varchar', length: 64 })
  diagramKey: string;

  /** The text the diagram came from, in full (StartRunRequest.source); a sweep cell has its sweep's. */
  @Column({ type: 'text', nullable: true })
  source: string | null;

  @Column({ type: 'integer' })
  crossings: number;

  @Column({ type: 'varchar', length: 10 })
  ring: string;

  @Column({ type: 'boolean' })
  reduced: boolean;

  /** Also compute the s-invariant (a knot's Khovanov run); its result then carries s. */
  @Column({ type: 'boolean', default: false })
  computeS: boolean;

  @Column({ type: 'simple-json', nullable: true })
  sweep: CableSweep | null;

  @Column({ type: 'simple-json', nullable: true })
  cable: CableCell | null;

  /** Fraction done, 0..1. */
  @Column({ type: 'real' })
  progress: number;

  /** Objects of the current complex. */
  @Column({ type: 'integer' })
  complexSize: number;

  @Column({ type: 'simple-json', nullable: true })
  result: KhResultJson | null;

  @Column({ type: 'text', nullable: true })
  error: string | null;

  @Column({ type: 'varchar', length: 36, nullable: true })
  reusedFrom: string | null;

  /**
   * Place in its starter's line: 1 + the live computations they had when it was queued. The
   * queue takes the lowest turn first (then the oldest), so one person's hundred runs do not
   * hold up another's first.
   */
  @Column({ type: 'integer', default: 1 })
  turn: number;

  /** Who computed it: host and process of the queue worker, or the server's own pool. */
  @Column({ type: 'varchar', length: 200, nullable: true })
  worker: string | null;

  @Column({ type: 'varchar', length: 40 })
  createdAt: string;

  @Column({ type: 'varchar', length: 40, nullable: true })
  startedAt: string | null;

  @Column({ type: 'varchar', length: 40, nullable: true })
  finishedAt: string | null;
}
