import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import type { CommentListResponse, CommentSubjectType, CommentView, CreateCommentRequest } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { ClassAccessRepository } from '../classroom/class-access.repository.js';
import { CommentAlerts } from './comment.alerts.js';
import { CommentRepository, type CommentRow, type Thread } from './comment.repository.js';

const MISSING: Record<CommentSubjectType, string> = {
  feeding: 'No feeding with this id.',
  'bake-plan': 'No bake plan with this id.',
};

function toView(row: CommentRow, thread: Thread, viewer: AccountRecord): CommentView {
  return {
    id: row.id,
    subjectType: thread.type,
    subjectId: thread.id,
    author: {
      id: row.authorId,
      displayName: row.authorName,
      role: row.authorId === thread.ownerId ? 'owner' : 'instructor',
    },
    body: row.body,
    createdAt: row.createdAt.toISOString(),
    mine: row.authorId === viewer.id,
  };
}

/**
 * Threads on a feeding or a bake plan. Who may read and write one: the log's owner, and an
 * instructor of a class the owner is a current member of, asked at every request. Everyone else
 * gets a 404, as if the feeding or plan did not exist.
 */
@Injectable()
export class CommentService {
  constructor(
    private readonly comments: CommentRepository,
    private readonly access: ClassAccessRepository,
    private readonly alerts: CommentAlerts,
  ) {}

  async list(
    viewer: AccountRecord,
    type: CommentSubjectType,
    id: string,
    page: { limit: number; offset: number },
  ): Promise<CommentListResponse> {
    const thread = await this.readable(viewer, type, id);
    const { items, total } = await this.comments.list(thread, page);
    return { items: items.map((row) => toView(row, thread, viewer)), total, limit: page.limit, offset: page.offset };
  }

  async create(
    viewer: AccountRecord,
    type: CommentSubjectType,
    id: string,
    request: CreateCommentRequest,
  ): Promise<CommentView> {
    const thread = await this.readable(viewer, type, id);
    const row = await this.comments.insert(thread, viewer.id, request.body);
    await this.alerts.commented(thread, row);
    return toView(row, thread, viewer);
  }

  /** Only its author deletes a comment; others who can read the thread get 403, the rest 404. */
  async delete(viewer: AccountRecord, commentId: string): Promise<void> {
    const row = await this.comments.find(commentId);
    const thread = row && (await this.threadOf(row));
    if (!row || !thread || !(await this.mayRead(viewer, thread))) {
      throw new NotFoundException('No comment with this id.');
    }
    if (row.authorId !== viewer.id) throw new ForbiddenException('Only its author can delete a comment.');
    await this.comments.delete(commentId);
  }

  private async readable(viewer: AccountRecord, type: CommentSubjectType, id: string): Promise<Thread> {
    const thread = type === 'feeding' ? await this.comments.feedingThread(id) : await this.comments.planThread(id);
    if (!thread || !(await this.mayRead(viewer, thread))) throw new NotFoundException(MISSING[type]);
    return thread;
  }

  private threadOf(row: CommentRow): Promise<Thread | undefined> {
    if (row.feedingId) return this.comments.feedingThread(row.feedingId);
    if (row.planId) return this.comments.planThread(row.planId);
    return Promise.resolve(undefined);
  }

  private async mayRead(viewer: AccountRecord, thread: Thread): Promise<boolean> {
    return thread.ownerId === viewer.id || (await this.access.instructsAnywhere(viewer.id, thread.ownerId));
  }
}
