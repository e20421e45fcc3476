import type { JobDetail } from '../../shared/schemas/jobs';
import { BoundedMap } from '../cache/bounded-map';
import type { Job } from './job.entities';
import type { ResultSession } from './run-results';

/**
 * `GET /api/jobs/:id` answers as JSON text. An answer is good while its key stands: the job's
 * revision (every run change moves the job's `updatedAt`, strictly later each time), the creator's
 * name, and what the results rest on (`ResultSession.answerBasis`: catalogue, flex parts and
 * currency-rate stamps and the shop's settings), all read from the database on every request, so a
 * write on any instance is seen at once.
 */
export class JobAnswers {
  private readonly answers = new BoundedMap<string>(200);

  async get(job: Job, creator: string, full: boolean, session: ResultSession, build: () => Promise<JobDetail>): Promise<string> {
    const key = `${job.id}@${new Date(job.updatedAt).getTime()}|${full ? 'full' : 'brief'}|${creator}|${await session.answerBasis()}`;
    return this.answers.getOr(key, async () => JSON.stringify({ job: await build() }));
  }
}
