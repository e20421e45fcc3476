/** Who changed what on a job, a run or a quote: the shop is a shared workbench, but nothing changes anonymously. */
export const ACTIVITY_SUBJECTS = ['job', 'run', 'quote'] as const;
export type ActivitySubject = (typeof ACTIVITY_SUBJECTS)[number];

export type ActivityAction = 'created' | 'edited' | 'archived' | 'unarchived' | 'deleted' | 'duplicated' | 'reordered' | 'sent' | 'refunded' | 'limit_overridden';

export interface ActivityChange {
  path: string;
  before: unknown;
  after: unknown;
}

export interface ActivityView {
  id: string;
  subject: ActivitySubject;
  subjectId: string;
  /** The run's name (or the job's, the quote's number) when it happened. */
  subjectName: string;
  action: ActivityAction;
  at: string;
  by: string | null;
  changes: ActivityChange[];
}
