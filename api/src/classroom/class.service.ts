import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import type {
  BakingClass,
  ClassListResponse,
  ClassMemberListResponse,
  CreateClassRequest,
  UpdateClassRequest,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { fieldError } from '../common/validation.js';
import { ClassRepository, type ClassFields, type ClassRow } from './class.repository.js';
import { classRangeProblem } from './dto/class-fields.js';
import { newJoinCode } from './join-code.js';

export const CLASS_NOT_FOUND = 'No class of yours with this id.';
export const INSTRUCTOR_ONLY = 'Only the class’s instructor can do this.';
const CREATE_ROLES = new Set(['instructor', 'admin']);
/** A collision needs two classes to draw the same of 32^8 codes; five in a row means a fault. */
const JOIN_CODE_ATTEMPTS = 5;

type Page = { limit: number; offset: number };

export function toBakingClass(row: ClassRow, viewerId: string): BakingClass {
  const teaches = row.instructorId === viewerId;
  return {
    id: row.id,
    name: row.name,
    description: row.description,
    startsOn: row.startsOn,
    endsOn: row.endsOn,
    instructor: { id: row.instructorId, displayName: row.instructorName },
    role: teaches ? 'instructor' : 'student',
    memberCount: row.memberCount,
    // The code lets anyone join: only the instructor hands it out.
    joinCode: teaches ? row.joinCode : null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** Classes and their members. Access: the instructor and current members see a class; others get 404. */
@Injectable()
export class ClassService {
  constructor(private readonly classes: ClassRepository) {}

  /** The class if the account teaches it or is a current member; 404 otherwise, so ids reveal nothing. */
  async requireVisible(account: AccountRecord, classId: string): Promise<ClassRow> {
    const row = await this.classes.find(account.id, classId);
    if (!row || (row.instructorId !== account.id && !row.viewerIsMember)) throw new NotFoundException(CLASS_NOT_FOUND);
    return row;
  }

  /** The class if the account teaches it; 403 for a student member, 404 for anyone else. */
  async requireInstructor(account: AccountRecord, classId: string): Promise<ClassRow> {
    const row = await this.requireVisible(account, classId);
    if (row.instructorId !== account.id) throw new ForbiddenException(INSTRUCTOR_ONLY);
    return row;
  }

  async get(account: AccountRecord, classId: string): Promise<BakingClass> {
    return toBakingClass(await this.requireVisible(account, classId), account.id);
  }

  async list(account: AccountRecord, page: Page): Promise<ClassListResponse> {
    const { items, total } = await this.classes.listVisible(account.id, page);
    return { items: items.map((r) => toBakingClass(r, account.id)), total, limit: page.limit, offset: page.offset };
  }

  async create(account: AccountRecord, request: CreateClassRequest): Promise<BakingClass> {
    if (!CREATE_ROLES.has(account.role)) {
      throw new ForbiddenException(
        'Only instructor accounts can create classes. Ask an administrator to make your account an instructor.',
      );
    }
    const fields: ClassFields = {
      name: request.name,
      description: request.description ?? '',
      startsOn: request.startsOn,
      endsOn: request.endsOn,
    };
    for (let attempt = 0; attempt < JOIN_CODE_ATTEMPTS; attempt++) {
      const id = await this.classes.insert(account.id, fields, newJoinCode());
      if (id) return this.get(account, id);
    }
    throw new Error('no free join code after several attempts');
  }

  async update(account: AccountRecord, classId: string, changes: UpdateClassRequest): Promise<BakingClass> {
    const current = await this.requireInstructor(account, classId);
    const fields: ClassFields = {
      name: changes.name ?? current.name,
      description: changes.description ?? current.description,
      startsOn: changes.startsOn ?? current.startsOn,
      endsOn: changes.endsOn ?? current.endsOn,
    };
    // The DTO checked a range sent whole; a moved end is checked against the stored other end.
    const problem = classRangeProblem(fields.startsOn, fields.endsOn);
    if (problem) throw fieldError(changes.endsOn !== undefined ? 'endsOn' : 'startsOn', problem);
    const edits = ['name', 'description', 'startsOn', 'endsOn'] as const;
    if (edits.some((k) => changes[k] !== undefined)) await this.classes.update(classId, fields);
    if (changes.joinCode === false) await this.classes.setJoinCode(classId, null);
    if (changes.joinCode === true) await this.rotateJoinCode(classId);
    return this.get(account, classId);
  }

  async delete(account: AccountRecord, classId: string): Promise<void> {
    await this.requireInstructor(account, classId);
    await this.classes.delete(classId);
  }

  async listMembers(account: AccountRecord, classId: string, page: Page): Promise<ClassMemberListResponse> {
    await this.requireInstructor(account, classId);
    const { items, total } = await this.classes.listMembers(classId, page);
    return {
      items: items.map((m) => ({ ...m, joinedAt: m.joinedAt.toISOString() })),
      total,
      limit: page.limit,
      offset: page.offset,
    };
  }

  /** The instructor removes a student; sharing ends with the next request (class-access reads left_at). */
  async removeMember(account: AccountRecord, classId: string, studentId: string): Promise<void> {
    await this.requireInstructor(account, classId);
    if (!(await this.classes.markLeft(classId, studentId))) {
      throw new NotFoundException('No current student with this id in the class.');
    }
  }

  /** A student leaves; sharing ends at once. */
  async leave(account: AccountRecord, classId: string): Promise<void> {
    const row = await this.requireVisible(account, classId);
    if (row.instructorId === account.id) {
      throw new ForbiddenException('You teach this class, so there is nothing to leave. Delete the class instead.');
    }
    // A concurrent removal may have ended the membership already; the outcome is the same.
    await this.classes.markLeft(classId, account.id);
  }

  private async rotateJoinCode(classId: string): Promise<void> {
    for (let attempt = 0; attempt < JOIN_CODE_ATTEMPTS; attempt++) {
      if (await this.classes.setJoinCode(classId, newJoinCode())) return;
    }
    throw new Error('no free join code after several attempts');
  }
}
