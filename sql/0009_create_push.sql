-- Web push: the server's VAPID key pair (made on first start, kept here so every API process signs
-- with the same key and subscriptions survive restarts) and the browsers that asked for
-- notifications. One row per push endpoint: a browser that signs in as someone else moves to them.

CREATE TABLE app_secret (
  name text PRIMARY KEY CHECK (name ~ '^[a-z][a-z0-9-]{1,40}$'),
  value jsonb NOT NULL CHECK (jsonb_typeof(value) = 'object'),
  created_at timestamptz NOT NULL DEFAULT now()
);

CREATE TABLE push_subscription (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  account_id uuid NOT NULL REFERENCES account (id) ON DELETE CASCADE,
  -- The browser vendor's push service URL for this browser (capability URL: never shown back).
  endpoint text NOT NULL UNIQUE CHECK (endpoint LIKE 'https://%' AND length(endpoint) <= 2000),
  -- The browser's P-256 public key and auth secret, base64url (RFC 8291).
  p256dh text NOT NULL CHECK (p256dh ~ '^[A-Za-z0-9_-]{80,100}$'),
  auth text NOT NULL CHECK (auth ~ '^[A-Za-z0-9_-]{16,32}$'),
  -- What the baker sees in the device list, e.g. "Chrome on Android".
  label text NOT NULL CHECK (length(label) BETWEEN 1 AND 120),
  created_at timestamptz NOT NULL DEFAULT now(),
  last_sent_at timestamptz,
  last_error text CHECK (length(last_error) <= 2000)
);
CREATE INDEX push_subscription_account_idx ON push_subscription (account_id);
