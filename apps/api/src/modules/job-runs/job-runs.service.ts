import type { JobRun, JobState } from '@porestack/types';
import { In, type EntityManager } from 'typeorm';
import type { QueryDeepPartialEntity } from 'typeorm/query-builder/QueryPartialEntity.js';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { jobVisible, type Viewer } from '../projects/project-scope.js';
import { JobRunEntity } from './job-run.entity.js';

export interface NewJobRun {
  organisationId: string;
  kind: string;
  testId?: string | null;
  uploadId?: string | null;
  createdById?: string | null;
  message?: string | null;
}

export function toJobRun(row: JobRunEntity): JobRun {
  return {
    id: row.id,
    kind: row.kind,
    state: row.state,
    progress: row.progress,
    message: row.message,
    testId: row.testId,
    result: row.result,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export const jobRuns = {
  async create(input: NewJobRun, manager: EntityManager = dataSource.manager): Promise<JobRunEntity> {
    const repo = manager.getRepository(JobRunEntity);
    return repo.save(
      repo.create({
        organisationId: input.organisationId,
        kind: input.kind,
        state: 'queued',
        progress: 0,
        message: input.message ?? 'Waiting for the worker.',
        testId: input.testId ?? null,
        uploadId: input.uploadId ?? null,
        createdById: input.createdById ?? null,
        result: null,
        bossJobId: null,
      }),
    );
  },

  /** Progress as the job goes; `progress` is a fraction 0–1. */
  async update(
    id: string,
    change: { state?: JobState; progress?: number; message?: string | null; result?: Record<string, unknown> | null; bossJobId?: string },
    manager: EntityManager = dataSource.manager,
  ): Promise<void> {
    const patch: QueryDeepPartialEntity<JobRunEntity> = {};
    if (change.state !== undefined) patch.state = change.state;
    if (change.progress !== undefined) patch.progress = Math.min(1, Math.max(0, change.progress));
    if (change.message !== undefined) patch.message = change.message;
    // jsonb: TypeORM's deep-partial type does not see that a record is one value.
    if (change.result !== undefined) patch.result = change.result as QueryDeepPartialEntity<Record<string, unknown>>;
    if (change.bossJobId !== undefined) patch.bossJobId = change.bossJobId;
    // Progress alone never touches a finished job: a late progress write must not overwrite its outcome.
    const where = change.state === undefined ? { id, state: In(['queued', 'running'] satisfies JobState[]) } : { id };
    await manager.getRepository(JobRunEntity).update(where, patch);
  },

  /** A job as the viewer may follow it (project-scope.ts: lab staff every job, anyone else their own); 404 otherwise. */
  async findFor(viewer: Viewer, id: string): Promise<JobRun> {
    const row = await dataSource.getRepository(JobRunEntity).findOneBy({ organisationId: viewer.orgId, id });
    if (!row || !jobVisible(viewer, row)) throw new NotFoundError('job');
    return toJobRun(row);
  },

  async find(orgId: string, id: string): Promise<JobRun> {
    const row = await dataSource.getRepository(JobRunEntity).findOneBy({ organisationId: orgId, id });
    if (!row) throw new NotFoundError('job');
    return toJobRun(row);
  },

  /** The newest job of this kind for a test, in any state (a failure seen after the fact). */
  async latestFor(orgId: string, testId: string, kind: string): Promise<JobRunEntity | null> {
    return dataSource
      .getRepository(JobRunEntity)
      .createQueryBuilder('run')
      .where('run.organisation_id = :orgId AND run.test_id = :testId AND run.kind = :kind', { orgId, testId, kind })
      .orderBy('run.created_at', 'DESC')
      .getOne();
  },
};
