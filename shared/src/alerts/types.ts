import type { AlertKind, AlertSubjectType } from '../contracts/alert.js';

/** An alert the rules say should exist; the API stores it under `slotKey` (unique per account). */
export interface WantedAlert {
  slotKey: string;
  kind: AlertKind;
  subjectType: AlertSubjectType;
  subjectId: string;
  /** The feeding it follows (culture alerts): deleting that feeding takes the alert with it. */
  feedingId: string | null;
  dueAt: string;
  /** After this, e-mail or push is no longer worth sending (in the app it still shows). */
  staleAt: string;
  title: string;
  body: string;
  linkPath: string;
}
