import type { MarkReplyView, MarkView } from '@driftmark/shared';
import type { User } from '../entities/user.entity.js';
import type { MarkThread } from '../repositories/mark.repository.js';

function person(user: User): MarkView['author'] {
  return { id: user.id, name: user.name, role: user.role };
}

/** Whose thread it is and who is looking: the read state is relative to both. */
export interface MarkViewer {
  userId: string;
  /** The athlete's own user id (the athlete's side of the thread). */
  athleteUserId: string;
}

/**
 * A mark as `viewer` sees it. `unread`: the mark (its latest edit) or a reply by someone other than
 * the viewer is newer than the viewer's last read; the author's own mark counts as read for them.
 * `readByOtherAt`: for staff, when the athlete last read it; for the athlete, when the mark's author did.
 */
export function presentMark(thread: MarkThread, viewer: MarkViewer): MarkView {
  const { mark, replies, reads } = thread;
  const readAt = (userId: string) => reads.find((r) => r.userId === userId)?.readAt ?? null;
  const mine = readAt(viewer.userId);
  const newer = (at: Date) => mine === null || at.getTime() > mine.getTime();
  const unread =
    (mark.authorId !== viewer.userId && newer(mark.updatedAt)) ||
    replies.some((r) => r.authorId !== viewer.userId && newer(r.createdAt));
  const other = viewer.userId === viewer.athleteUserId ? mark.authorId : viewer.athleteUserId;
  return {
    id: mark.id,
    athleteId: mark.athleteId,
    author: person(mark.author),
    metric: mark.metric,
    fromDate: mark.fromDate,
    toDate: mark.toDate,
    note: mark.note,
    createdAt: mark.createdAt.toISOString(),
    updatedAt: mark.updatedAt.toISOString(),
    replies: replies.map((r): MarkReplyView => ({
      id: r.id,
      author: person(r.author),
      body: r.body,
      createdAt: r.createdAt.toISOString(),
    })),
    unread,
    readByOtherAt: readAt(other)?.toISOString() ?? null,
  };
}
