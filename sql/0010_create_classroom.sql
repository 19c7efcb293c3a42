-- Classroom: an instructor's classes, their members, e-mailed invitations, and comment threads on a
-- student's feedings and bakes. Sharing is narrow on purpose: a class's instructor may READ the logs
-- of the class's CURRENT members (left_at IS NULL) and write only comments; nobody else reads them.
-- Leaving ends the sharing at once because every access check reads class_member at request time.

CREATE TABLE baking_class (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  instructor_id uuid NOT NULL REFERENCES account (id) ON DELETE CASCADE,
  name text NOT NULL CHECK (length(name) BETWEEN 1 AND 120 AND name = btrim(name)),
  description text NOT NULL DEFAULT '' CHECK (length(description) <= 2000),
  starts_on date NOT NULL,
  ends_on date NOT NULL,
  -- Eight characters from an alphabet without look-alikes; NULL = joining by code is off.
  join_code text UNIQUE CHECK (join_code ~ '^[A-HJ-NP-Z2-9]{8}$'),
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  CHECK (ends_on >= starts_on)
);
CREATE INDEX baking_class_instructor_idx ON baking_class (instructor_id);

CREATE TABLE class_member (
  class_id uuid NOT NULL REFERENCES baking_class (id) ON DELETE CASCADE,
  account_id uuid NOT NULL REFERENCES account (id) ON DELETE CASCADE,
  joined_at timestamptz NOT NULL DEFAULT now(),
  -- Set when the student leaves or the instructor removes them; joining again clears it.
  left_at timestamptz,
  PRIMARY KEY (class_id, account_id)
);
-- "Which classes is this baker in now?" (the access check runs it on every shared read).
CREATE INDEX class_member_account_idx ON class_member (account_id) WHERE left_at IS NULL;

-- An invitation goes to an e-mail address that may not have an account yet, so it is not an
-- account_token. Only the SHA-256 of the token is kept; it is spent with a conditional UPDATE.
CREATE TABLE class_invite (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  class_id uuid NOT NULL REFERENCES baking_class (id) ON DELETE CASCADE,
  -- Lower-cased; accepting requires a signed-in account with this address.
  email text NOT NULL CHECK (length(email) BETWEEN 3 AND 254 AND email = lower(email)),
  token_hash text NOT NULL UNIQUE CHECK (token_hash ~ '^[0-9a-f]{64}$'),
  created_at timestamptz NOT NULL DEFAULT now(),
  expires_at timestamptz NOT NULL,
  used_at timestamptz,
  used_by uuid REFERENCES account (id) ON DELETE SET NULL,
  revoked_at timestamptz,
  CHECK (expires_at > created_at)
);
CREATE INDEX class_invite_class_idx ON class_invite (class_id, created_at DESC);

-- A thread on one feeding or one bake plan, written by its owner or an instructor who may read it.
CREATE TABLE comment (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  author_id uuid NOT NULL REFERENCES account (id) ON DELETE CASCADE,
  feeding_id uuid REFERENCES feeding (id) ON DELETE CASCADE,
  plan_id uuid REFERENCES bake_plan (id) ON DELETE CASCADE,
  body text NOT NULL CHECK (length(body) BETWEEN 1 AND 2000 AND body = btrim(body)),
  created_at timestamptz NOT NULL DEFAULT now(),
  CHECK ((feeding_id IS NULL) <> (plan_id IS NULL))
);
CREATE INDEX comment_feeding_idx ON comment (feeding_id, created_at) WHERE feeding_id IS NOT NULL;
CREATE INDEX comment_plan_idx ON comment (plan_id, created_at) WHERE plan_id IS NOT NULL;

-- A new comment reaches the other side as an alert (in the app, and by e-mail/push per preferences).
ALTER TABLE alert DROP CONSTRAINT alert_kind_check;
ALTER TABLE alert ADD CONSTRAINT alert_kind_check
  CHECK (kind IN ('culture-ready', 'past-peak', 'feeding-due', 'plan-step', 'comment'));
ALTER TABLE alert ADD COLUMN comment_id uuid REFERENCES comment (id) ON DELETE CASCADE;
