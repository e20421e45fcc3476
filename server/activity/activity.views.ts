import type { ActivityChange, ActivityView } from '../../shared/schemas/activity';
import type { ActivityEntry } from './activity.entity';

/** Each named field whose value differs, before and after (values compared as JSON). */
export function changesBetween<T extends object>(before: T, after: Partial<T>): ActivityChange[] {
  return Object.keys(after)
    .filter((key) => JSON.stringify((before as Record<string, unknown>)[key]) !== JSON.stringify((after as Record<string, unknown>)[key]))
    .map((key) => ({ path: key, before: (before as Record<string, unknown>)[key] ?? null, after: (after as Record<string, unknown>)[key] ?? null }));
}

export function activityView(a: ActivityEntry): ActivityView {
  return {
    id: a.id,
    subject: a.subject,
    subjectId: a.subjectId,
    subjectName: a.subjectName,
    action: a.action,
    at: new Date(a.at).toISOString(),
    by: a.userName,
    changes: a.changes,
  };
}
