-- Alerts: reminders scheduled from a culture's prediction or a bake plan's live steps, delivered
-- once per channel. The alert row is the promise (one per slot key: account, kind, subject,
-- occurrence); alert_delivery is the exactly-once record per channel, claimed with a conditional
-- UPDATE before sending. The job queue (pg-boss, in its own schema) only wakes the worker.

CREATE TABLE alert (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  account_id uuid NOT NULL REFERENCES account (id) ON DELETE CASCADE,
  kind text NOT NULL CHECK (kind IN ('culture-ready', 'past-peak', 'feeding-due', 'plan-step')),
  subject_type text NOT NULL CHECK (subject_type IN ('culture', 'bake-plan')),
  -- Deleting the culture, the feeding an alert follows or the plan takes its alerts with it.
  culture_id uuid REFERENCES culture (id) ON DELETE CASCADE,
  feeding_id uuid REFERENCES feeding (id) ON DELETE CASCADE,
  plan_id uuid REFERENCES bake_plan (id) ON DELETE CASCADE,
  slot_key text NOT NULL CHECK (length(slot_key) BETWEEN 1 AND 300),
  due_at timestamptz NOT NULL,
  -- After this, e-mail and push are not worth sending.
  stale_at timestamptz NOT NULL,
  -- pending: scheduled; sent: shown in the app; cancelled: no longer wanted. A pending alert whose
  -- time changed stays pending with its new due_at (moved_at says when it last moved).
  status text NOT NULL DEFAULT 'pending' CHECK (status IN ('pending', 'sent', 'cancelled')),
  title text NOT NULL CHECK (length(title) BETWEEN 1 AND 200),
  body text NOT NULL CHECK (length(body) BETWEEN 1 AND 1000),
  link_path text NOT NULL CHECK (link_path LIKE '/%'),
  sent_at timestamptz,
  read_at timestamptz,
  cancelled_at timestamptz,
  moved_at timestamptz,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  UNIQUE (account_id, slot_key),
  CHECK ((subject_type = 'culture') = (culture_id IS NOT NULL)),
  CHECK ((subject_type = 'bake-plan') = (plan_id IS NOT NULL)),
  CHECK ((status = 'sent') = (sent_at IS NOT NULL)),
  CHECK ((status = 'cancelled') = (cancelled_at IS NOT NULL))
);

-- The Alerts page (unread first, newest due first) and the badge's unread count.
CREATE INDEX alert_account_list_idx ON alert (account_id, (read_at IS NULL) DESC, due_at DESC, id) WHERE status = 'sent';
CREATE INDEX alert_culture_idx ON alert (culture_id) WHERE culture_id IS NOT NULL;
CREATE INDEX alert_feeding_idx ON alert (feeding_id) WHERE feeding_id IS NOT NULL;
CREATE INDEX alert_plan_idx ON alert (plan_id) WHERE plan_id IS NOT NULL;

CREATE TABLE alert_delivery (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  alert_id uuid NOT NULL REFERENCES alert (id) ON DELETE CASCADE,
  channel text NOT NULL CHECK (channel IN ('in-app', 'email', 'push')),
  -- The earliest this channel may send: the due time, or the end of quiet hours.
  send_after timestamptz NOT NULL,
  -- A worker's claim; one older than the claim timeout may be taken over (the worker died).
  claimed_at timestamptz,
  sent_at timestamptz,
  -- Quiet hours held it past staleness, or the alert was cancelled.
  dropped_at timestamptz,
  attempts integer NOT NULL DEFAULT 0 CHECK (attempts >= 0),
  last_error text CHECK (length(last_error) <= 2000),
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  UNIQUE (alert_id, channel),
  CHECK (sent_at IS NULL OR dropped_at IS NULL)
);

CREATE TABLE alert_preference (
  account_id uuid PRIMARY KEY REFERENCES account (id) ON DELETE CASCADE,
  lead_minutes integer NOT NULL CHECK (lead_minutes BETWEEN 0 AND 240),
  -- Local clock times in the account's zone; both or neither.
  quiet_from text CHECK (quiet_from ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$'),
  quiet_until text CHECK (quiet_until ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$'),
  -- { "<kind>": { "email": bool, "push": bool } }; the app is always on.
  channels jsonb NOT NULL CHECK (jsonb_typeof(channels) = 'object'),
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  CHECK ((quiet_from IS NULL) = (quiet_until IS NULL))
);
