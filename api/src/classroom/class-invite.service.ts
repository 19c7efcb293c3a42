import { ConflictException, Injectable, Logger, NotFoundException } from '@nestjs/common';
import {
  CLASS_INVITE_TTL_DAYS,
  CLASS_SHARING_TERMS,
  type ClassInviteListResponse,
  type CreateClassInvitesResponse,
} from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { MailService } from '../mail/mail.service.js';
import { ClassInviteRepository, type InviteRow } from './class-invite.repository.js';
import type { ClassRow } from './class.repository.js';
import { ClassService } from './class.service.js';
import { hashInviteToken, newInviteToken, toClassInvite } from './invite-token.js';

/** "7 March 2026": a calendar date, so no time zone can move it. */
export function longDate(date: string): string {
  return new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' }).format(
    new Date(`${date}T00:00:00Z`),
  );
}

/** The instructor's side of invitations: send, list, revoke. Joining by link is ClassJoinService. */
@Injectable()
export class ClassInviteService {
  private readonly logger = new Logger('ClassInvite');

  constructor(
    private readonly classes: ClassService,
    private readonly invites: ClassInviteRepository,
    private readonly mail: MailService,
  ) {}

  /**
   * One single-use link per address (duplicates in the request collapse to one). The mail goes
   * out after the answer, like a password reset's, so a slow SMTP server does not hold the page.
   */
  async create(account: AccountRecord, classId: string, emails: string[]): Promise<CreateClassInvitesResponse> {
    const row = await this.classes.requireInstructor(account, classId);
    const tokens = new Map([...new Set(emails)].map((email) => [email, newInviteToken()]));
    const stored = await this.invites.insertMany(
      classId,
      [...tokens].map(([email, token]) => ({ email, tokenHash: hashInviteToken(token) })),
      CLASS_INVITE_TTL_DAYS,
    );
    for (const invite of stored) void this.sendInvite(row, invite, tokens.get(invite.email)!);
    return { invites: stored.map((i) => toClassInvite(i)) };
  }

  async list(account: AccountRecord, classId: string, page: { limit: number; offset: number }) {
    await this.classes.requireInstructor(account, classId);
    const { items, total } = await this.invites.list(classId, page);
    const now = new Date();
    const response: ClassInviteListResponse = {
      items: items.map((i) => toClassInvite(i, now)),
      total,
      limit: page.limit,
      offset: page.offset,
    };
    return response;
  }

  /** The link stops working at once. An accepted invitation stays (remove the student instead). */
  async revoke(account: AccountRecord, classId: string, inviteId: string): Promise<void> {
    await this.classes.requireInstructor(account, classId);
    const invite = await this.invites.findInClass(classId, inviteId);
    if (!invite) throw new NotFoundException('No invitation with this id in the class.');
    if (invite.revokedAt) return;
    if (invite.usedAt || !(await this.invites.revoke(inviteId))) {
      throw new ConflictException('This invitation was already accepted. To end the sharing, remove the student.');
    }
  }

  private async sendInvite(cls: ClassRow, invite: InviteRow, token: string): Promise<void> {
    const subject = `${cls.instructorName} invites you to the class “${cls.name}” on Peakwise`;
    const body = this.mail.compose({
      heading: `Join “${cls.name}”`,
      paragraphs: [
        'Hello,',
        `${cls.instructorName} invites you to the class “${cls.name}” on Peakwise, a sourdough logbook. The class runs from ${longDate(cls.startsOn)} to ${longDate(cls.endsOn)}.`,
        ...(cls.description ? [`About the class: ${cls.description}`] : []),
        `Joining shares with ${cls.instructorName}:`,
        ...CLASS_SHARING_TERMS.map((term) => `• ${term}.`),
        `To join, sign in (or create an account) with this address, ${invite.email}, then open the link below. You will see the class before you accept.`,
      ],
      action: { label: 'See the class', path: `/invites/${token}` },
      note: `The link works for ${CLASS_INVITE_TTL_DAYS} days and only once. If you do not want to join, ignore this mail: nothing is shared unless you accept.`,
      alertSettingsLink: false,
    });
    try {
      await this.mail.send({ to: invite.email, subject, key: `class-invite:${invite.id}`, ...body });
    } catch (error) {
      // Never the token or the address in the log: together they are a usable link.
      this.logger.error(`class-invite mail ${invite.id} not sent: ${(error as Error).message}`);
    }
  }
}
