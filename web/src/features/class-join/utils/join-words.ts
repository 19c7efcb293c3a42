import { isApiError } from '@/lib/api-client';

// Built from parts: the locale's own punctuation differs with and without a year.
function day(iso: string, withYear: boolean): string {
  const parts = new Intl.DateTimeFormat('en-GB', {
    timeZone: 'UTC',
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
  }).formatToParts(new Date(`${iso}T00:00:00Z`));
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  const words = [part('weekday'), part('day'), part('month')];
  if (withYear) words.push(part('year'));
  return words.join(' ');
}

/** "2027-01-09", "2027-02-13" → "Sat 9 Jan – Sat 13 Feb 2027" (calendar dates: no zone shift). */
export function classDates(startsOn: string, endsOn: string): string {
  const sameYear = startsOn.slice(0, 4) === endsOn.slice(0, 4);
  return `${day(startsOn, !sameYear)} – ${day(endsOn, true)}`;
}

/** Why an invitation or code cannot be used, said to the person holding it. */
export interface JoinProblem {
  kind: 'gone' | 'other-account' | 'unknown' | 'failed';
  title: string;
  message: string;
  /** For 'other-account': the address signed in now, said after the message. */
  signedInAs?: string;
}

/**
 * The API's refusals of an invitation, in words: 410 used, expired or revoked (the server's own
 * message says which and what to do); 403 not for this account (sent to another address, or the
 * viewer teaches the class), naming who is signed in; 404 no such invitation.
 */
export function inviteProblem(error: unknown, signedInEmail: string): JoinProblem {
  const status = isApiError(error) ? error.status : 0;
  const said = isApiError(error) ? error.message : '';
  if (status === 410)
    return {
      kind: 'gone',
      title: 'This invitation can no longer be used',
      message: said || 'Ask your instructor for a new one, or for the class’s join code.',
    };
  if (status === 403)
    return {
      kind: 'other-account',
      title: 'This invitation is not for this account',
      message: said || 'This invitation was sent to another address.',
      signedInAs: signedInEmail,
    };
  if (status === 404)
    return {
      kind: 'unknown',
      title: 'We can’t find this invitation',
      message:
        'The link may be incomplete: open it again from the e-mail, or copy the whole address. If it still fails, ask your instructor for a new invitation.',
    };
  return {
    kind: 'failed',
    title: 'The invitation did not load',
    message: said || 'Something went wrong. Please try again.',
  };
}
