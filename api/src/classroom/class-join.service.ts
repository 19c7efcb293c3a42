import { ForbiddenException, GoneException, Injectable, NotFoundException } from '@nestjs/common';
import { CLASS_SHARING_TERMS, type BakingClass, type ClassJoinPreview } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { fieldError } from '../common/validation.js';
import { ClassInviteRepository, type InviteRow } from './class-invite.repository.js';
import { ClassRepository, type ClassRow } from './class.repository.js';
import { toBakingClass } from './class.service.js';
import { JOIN_CODE_MESSAGE } from './dto/invite.dto.js';
import { INVITE_TOKEN_PATTERN, hashInviteToken, inviteStatus } from './invite-token.js';
import { JOIN_CODE_PATTERN, normaliseJoinCode } from './join-code.js';

const UNKNOWN_LINK = 'No invitation with this link. Check that you opened the whole link from the e-mail.';
const GONE: Record<'accepted' | 'revoked' | 'expired', string> = {
  accepted: 'This invitation was already used. Ask your instructor for a new one, or for the class’s join code.',
  revoked: 'This invitation was withdrawn by the instructor. Ask them for a new one if you should be in the class.',
  expired: 'This invitation has expired. Ask your instructor for a new one.',
};
const UNKNOWN_CODE = 'No class with this join code. Check it with your instructor: they may have changed it.';
const OWN_CLASS = 'You teach this class, so you cannot join it as a student.';

function toPreview(row: ClassRow): ClassJoinPreview {
  return {
    name: row.name,
    description: row.description,
    startsOn: row.startsOn,
    endsOn: row.endsOn,
    instructorName: row.instructorName,
    shares: [...CLASS_SHARING_TERMS],
    alreadyMember: row.viewerIsMember,
  };
}

/** A student joining: by an e-mailed invitation link or by the class's join code. */
@Injectable()
export class ClassJoinService {
  constructor(
    private readonly classes: ClassRepository,
    private readonly invites: ClassInviteRepository,
  ) {}

  async previewInvite(account: AccountRecord, token: string): Promise<ClassJoinPreview> {
    const invite = await this.usableInvite(account, token);
    return toPreview(await this.joinable(account, invite.classId));
  }

  async acceptInvite(account: AccountRecord, token: string): Promise<BakingClass> {
    const invite = await this.usableInvite(account, token);
    await this.joinable(account, invite.classId);
    const classId = await this.invites.accept(hashInviteToken(token), account.id, account.email);
    // Checked as usable a moment ago, so a miss means another request spent (or revoked) it first.
    if (!classId) throw new GoneException(GONE[this.goneStatus(await this.invites.findByHash(hashInviteToken(token)))]);
    return this.classView(account, classId);
  }

  async previewCode(account: AccountRecord, code: string): Promise<ClassJoinPreview> {
    return toPreview(await this.classByCode(account, code));
  }

  /** Joining while already a member changes nothing and answers the class all the same. */
  async joinByCode(account: AccountRecord, code: string): Promise<BakingClass> {
    const row = await this.classByCode(account, code);
    await this.classes.join(row.id, account.id);
    return this.classView(account, row.id);
  }

  /**
   * The invitation behind `token`, if this account may use it now. The address is checked first,
   * so someone holding another's link learns nothing about the class or the link's state.
   */
  private async usableInvite(account: AccountRecord, token: string): Promise<InviteRow> {
    const invite = INVITE_TOKEN_PATTERN.test(token) ? await this.invites.findByHash(hashInviteToken(token)) : undefined;
    if (!invite) throw new NotFoundException(UNKNOWN_LINK);
    if (invite.email !== account.email) {
      throw new ForbiddenException(
        'This invitation was sent to another address. Sign in with the address it was sent to.',
      );
    }
    const status = inviteStatus(invite);
    if (status !== 'pending') throw new GoneException(GONE[status]);
    return invite;
  }

  private goneStatus(invite: InviteRow | undefined): 'accepted' | 'revoked' | 'expired' {
    const status = invite ? inviteStatus(invite) : 'accepted';
    return status === 'pending' ? 'accepted' : status;
  }

  private async joinable(account: AccountRecord, classId: string): Promise<ClassRow> {
    const row = await this.classes.find(account.id, classId);
    if (!row) throw new NotFoundException(UNKNOWN_LINK);
    if (row.instructorId === account.id) throw new ForbiddenException(OWN_CLASS);
    return row;
  }

  private async classByCode(account: AccountRecord, raw: string): Promise<ClassRow> {
    const code = normaliseJoinCode(raw);
    if (!JOIN_CODE_PATTERN.test(code)) throw fieldError('code', JOIN_CODE_MESSAGE);
    const row = await this.classes.findByJoinCode(account.id, code);
    if (!row) throw new NotFoundException(UNKNOWN_CODE);
    if (row.instructorId === account.id) throw new ForbiddenException(OWN_CLASS);
    return row;
  }

  private async classView(account: AccountRecord, classId: string): Promise<BakingClass> {
    const row = await this.classes.find(account.id, classId);
    if (!row) throw new NotFoundException(UNKNOWN_LINK);
    return toBakingClass(row, account.id);
  }
}
