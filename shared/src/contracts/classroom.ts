import type { PageQuery, Paged, SortOrder } from './paging.js';

// Classroom: an instructor's classes, their students, and what the instructor may see of the
// students' logs. Sharing is read-only and lasts while the student is a current member: the
// instructor of a class reads its members' cultures, feedings and bakes, and writes only comments.
// Dates are calendar dates (YYYY-MM-DD); times are ISO 8601 in UTC.
//
// Routes (every one needs a signed-in account; another's class or a non-member answers 404):
//   GET/POST /api/classes · GET/PATCH/DELETE /api/classes/:classId      (create: instructor or admin role)
//   GET /api/classes/:classId/members · DELETE /api/classes/:classId/members/:studentId (instructor)
//   POST /api/classes/:classId/leave                                    (student; 204)
//   GET/POST /api/classes/:classId/invites · DELETE /api/classes/:classId/invites/:inviteId
//   GET /api/class-invites/:token · POST /api/class-invites/:token/accept   (200; 403 sent to another
//     address or your own class, 410 used/expired/revoked, 404 unknown)
//   GET /api/class-join/:code · POST /api/class-join                     (200; code case- and space-blind)
//   GET /api/classes/:classId/roster · /roster.csv · /progress          (instructor)
//   Read-only drill-down, instructor of a class the owner is a current member of (same shapes as the
//   owner's routes): GET /api/classes/:classId/students/:studentId/cultures · …/students/:studentId/plans
//   · /api/classes/:classId/cultures/:cultureId · …/cultures/:cultureId/summary · …/cultures/:cultureId/feedings
//   · /api/classes/:classId/feedings/:feedingId · …/feedings/:feedingId/rise-checks · /api/classes/:classId/plans/:planId
//   Comments (owner, or instructor who may read the log): GET/POST /api/feedings/:feedingId/comments,
//   GET/POST /api/plans/:planId/comments, DELETE /api/comments/:commentId (author only).

export const CLASS_NAME_MAX_LENGTH = 120;
export const CLASS_DESCRIPTION_MAX_LENGTH = 2000;
/** A class runs at most this long, first and last day counted (a year covers every course we have heard of). */
export const CLASS_MAX_DAYS = 366;
/** Join codes: 8 characters from an alphabet without look-alikes (no I, O, 0, 1). */
export const JOIN_CODE_ALPHABET = 'ABCDEFGHJKLMNPQRSTUVWXYZ23456789';
export const JOIN_CODE_LENGTH = 8;
/** An e-mailed invitation link works this long, once. */
export const CLASS_INVITE_TTL_DAYS = 14;
export const CLASS_INVITES_MAX_PER_REQUEST = 50;
export const COMMENT_MAX_LENGTH = 2000;

/** What joining shares, shown before a student accepts (the same words the API enforces). */
export const CLASS_SHARING_TERMS = [
  "Your cultures' logs (feedings, rise checks, temperatures) and your bakes, read-only",
  'Only with this class’s instructor, only while you are a member',
  'Comments the instructor leaves on your feedings and bakes',
  'You can leave the class at any time; sharing ends at once',
] as const;

/** How the signed-in account relates to a class. */
export type ClassRole = 'instructor' | 'student';

export interface ClassPerson {
  id: string;
  displayName: string;
}

export interface BakingClass {
  id: string;
  name: string;
  description: string;
  startsOn: string;
  endsOn: string;
  instructor: ClassPerson;
  /** The viewer's relation to the class. */
  role: ClassRole;
  /** Current members (students who have not left). */
  memberCount: number;
  /** Only for the instructor; null when joining by code is off. */
  joinCode: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface CreateClassRequest {
  name: string;
  description?: string;
  startsOn: string;
  endsOn: string;
}

export interface UpdateClassRequest extends Partial<CreateClassRequest> {
  /** true: make a new join code (the old one stops working); false: turn joining by code off. */
  joinCode?: boolean;
}

/** Classes the viewer teaches and classes they are a current member of. */
export type ClassListResponse = Paged<BakingClass>;

// ---- members

export interface ClassMember {
  id: string;
  displayName: string;
  email: string;
  joinedAt: string;
}

export type ClassMemberListResponse = Paged<ClassMember>;

// ---- invitations and joining

export type ClassInviteStatus = 'pending' | 'accepted' | 'expired' | 'revoked';

export interface ClassInvite {
  id: string;
  email: string;
  status: ClassInviteStatus;
  createdAt: string;
  expiresAt: string;
  acceptedAt: string | null;
}

export interface CreateClassInvitesRequest {
  /** 1–50 addresses; each gets its own single-use link by e-mail. */
  emails: string[];
}

export interface CreateClassInvitesResponse {
  invites: ClassInvite[];
}

export type ClassInviteListResponse = Paged<ClassInvite>;

/** What a student sees before joining, from an invitation link or a join code. */
export interface ClassJoinPreview {
  name: string;
  description: string;
  startsOn: string;
  endsOn: string;
  instructorName: string;
  /** CLASS_SHARING_TERMS, as the API states them. */
  shares: string[];
  /** The signed-in viewer is already a current member. */
  alreadyMember: boolean;
}

export interface JoinClassByCodeRequest {
  code: string;
}

// ---- roster (the instructor's table)

/**
 * - `overdue`: not fed for longer than its routine (counter daily, fridge weekly) allows.
 * - `sluggish`: normalised time-to-peak rising, or rise multiple falling, over recent feedings.
 * - `caution`: a recent feeding noted discolouration (pink, orange, fuzzy): discard, do not rescue.
 * - `no-rise-checks`: recent feedings have no rise checks, so the model cannot say much.
 * - `no-culture`: the student has no culture logged yet.
 */
export const ROSTER_FLAGS = ['overdue', 'sluggish', 'caution', 'no-rise-checks', 'no-culture'] as const;
export type RosterFlag = (typeof ROSTER_FLAGS)[number];

/** One row per student culture (a student without a culture gets one row with nulls). */
export interface RosterRow {
  studentId: string;
  studentName: string;
  cultureId: string | null;
  cultureName: string | null;
  lastFedAt: string | null;
  hoursSinceFed: number | null;
  /**
   * The latest completed feeding's time to peak normalised to a 1:1:1 feeding at 24 °C (the class
   * chart's last point), hours; the culture's fitted value while no feeding has finished.
   */
  hoursToPeakAtReference: number | null;
  /** Peak height ÷ initial height of the latest feeding with rise checks. */
  riseMultiple: number | null;
  trend: 'steady' | 'faster' | 'slower' | null;
  flags: RosterFlag[];
}

export const ROSTER_SORTS = ['student', 'lastFed', 'hoursToPeak', 'riseMultiple', 'flags', 'sluggish'] as const;
export type RosterSort = (typeof ROSTER_SORTS)[number];

export interface RosterQuery extends PageQuery {
  sort?: RosterSort;
  order?: SortOrder;
  /** Only rows with this flag. */
  flag?: RosterFlag;
  /** Part of a student's or culture's name. */
  q?: string;
}

export type RosterResponse = Paged<RosterRow>;

/** The class chart: each student culture's normalised time-to-peak over the weeks. */
export interface ClassProgressSeries {
  studentId: string;
  studentName: string;
  cultureId: string;
  cultureName: string;
  points: { fedAt: string; hoursToPeakAtReference: number }[];
}

export interface ClassProgressResponse {
  series: ClassProgressSeries[];
}

// ---- comments

export type CommentSubjectType = 'feeding' | 'bake-plan';

export interface CommentView {
  id: string;
  subjectType: CommentSubjectType;
  subjectId: string;
  author: ClassPerson & { role: 'owner' | 'instructor' };
  body: string;
  createdAt: string;
  /** The viewer wrote it (and may delete it). */
  mine: boolean;
}

export interface CreateCommentRequest {
  body: string;
}

export type CommentListResponse = Paged<CommentView>;
