import { Injectable } from '@nestjs/common';
import { alertSlotKey, type AlertKind } from '@peakwise/shared';
import { AlertNotifier, clip, type ImmediateAlert } from '../alert/alert.notify.js';
import { ClassAccessRepository } from '../classroom/class-access.repository.js';
import type { CommentRow, Thread } from './comment.repository.js';

/** An alert shows the start of the comment, not all of it (2000 characters do not fit a phone). */
export const COMMENT_EXCERPT_LENGTH = 140;
const KIND: AlertKind = 'comment';

/**
 * The other side of a thread hears of a new comment: the owner's comment goes to every instructor
 * who may read it now, an instructor's goes to the owner. Each gets their own alert, linking to
 * the page they read the log on.
 */
@Injectable()
export class CommentAlerts {
  constructor(
    private readonly access: ClassAccessRepository,
    private readonly notifier: AlertNotifier,
  ) {}

  async commented(thread: Thread, comment: CommentRow): Promise<void> {
    if (comment.authorId !== thread.ownerId) {
      await this.notifier.notify(this.alert(thread, comment, thread.ownerId, ownerLink(thread)));
      return;
    }
    for (const instructorId of await this.access.instructorsOf(thread.ownerId)) {
      if (instructorId === thread.ownerId) continue;
      const classId = await this.access.sharedClass(instructorId, thread.ownerId);
      // Left the class between the two queries: no longer theirs to read.
      if (!classId) continue;
      await this.notifier.notify(this.alert(thread, comment, instructorId, instructorLink(thread, classId)));
    }
  }

  private alert(thread: Thread, comment: CommentRow, recipientId: string, linkPath: string): ImmediateAlert {
    const whose = recipientId === thread.ownerId ? 'your' : 'their';
    const what = thread.type === 'feeding' ? `${whose} feeding of ${thread.name}` : `${whose} ${thread.name} bake`;
    return {
      accountId: recipientId,
      kind: KIND,
      subject: thread.cultureId ? { cultureId: thread.cultureId } : { planId: thread.id },
      commentId: comment.id,
      slotKey: alertSlotKey(recipientId, KIND, thread.id, `comment:${comment.id}`),
      title: `${comment.authorName} commented on ${what}`,
      body: clip(comment.body.replace(/\s+/g, ' '), COMMENT_EXCERPT_LENGTH),
      linkPath,
    };
  }
}

function ownerLink(thread: Thread): string {
  return thread.type === 'feeding' ? `/feedings/${thread.id}` : `/bench/${thread.id}`;
}

function instructorLink(thread: Thread, classId: string): string {
  return thread.type === 'feeding'
    ? `/classes/${classId}/feedings/${thread.id}`
    : `/classes/${classId}/plans/${thread.id}`;
}
