import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import type { AccountRecord } from '../account/account.repository.js';
import { ClassAccessRepository } from '../classroom/class-access.repository.js';
import { ClassLogsRepository, type LogKind } from './class-logs.repository.js';

const NO_CLASS = 'No class with this id.';
const NOT_FOUND: Record<LogKind, string> = {
  culture: 'No culture with this id in this class.',
  feeding: 'No feeding with this id in this class.',
  plan: 'No bake plan with this id in this class.',
};

/**
 * The door of every class-logs route: another's class is a 404 like a missing id, a student of
 * the class gets 403 (they know it exists), and a log row is shown only while its owner is a
 * current member (ClassAccessRepository.instructsInClass, asked on each request).
 */
@Injectable()
export class ClassLogsAccess {
  constructor(
    private readonly logs: ClassLogsRepository,
    private readonly access: ClassAccessRepository,
  ) {}

  async requireInstructor(account: AccountRecord, classId: string): Promise<void> {
    const role = await this.logs.roleIn(account.id, classId);
    if (role === 'student') throw new ForbiddenException('Only the class’s instructor sees its roster and logs.');
    if (role !== 'instructor') throw new NotFoundException(NO_CLASS);
  }

  /** The student is a current member whose logs the viewer may read; else 404. */
  async requireStudent(account: AccountRecord, classId: string, studentId: string): Promise<void> {
    await this.requireInstructor(account, classId);
    if (!(await this.access.instructsInClass(account.id, classId, studentId))) {
      throw new NotFoundException('No student with this id in this class.');
    }
  }

  /** The owner of a culture, feeding or plan the viewer may read in this class; else 404. */
  async requireOwner(account: AccountRecord, classId: string, kind: LogKind, id: string): Promise<string> {
    await this.requireInstructor(account, classId);
    const owner = await this.logs.ownerOf(kind, id);
    if (!owner || !(await this.access.instructsInClass(account.id, classId, owner))) {
      throw new NotFoundException(NOT_FOUND[kind]);
    }
    return owner;
  }

  /** Of these students, the ones whose logs the viewer may read now. */
  async readable(account: AccountRecord, classId: string, studentIds: string[]): Promise<Set<string>> {
    const allowed = await Promise.all(studentIds.map((id) => this.access.instructsInClass(account.id, classId, id)));
    return new Set(studentIds.filter((_, i) => allowed[i]));
  }
}
