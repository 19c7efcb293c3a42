-- The culture logbook: cultures, their feedings, and the rise checks and temperatures of each
-- feeding. Limits mirror the API's validation (shared/src/contracts/culture.ts) so a bug there
-- cannot store what the API would refuse. Everything hangs off an account and goes with it.

CREATE TABLE culture (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  account_id uuid NOT NULL REFERENCES account (id) ON DELETE CASCADE,
  name text NOT NULL CHECK (length(name) BETWEEN 1 AND 80 AND name = btrim(name)),
  notes text CHECK (length(notes) BETWEEN 1 AND 2000),
  -- A flour's name or a blend described in words ("70 % bread flour, 30 % whole rye").
  default_flour text CHECK (length(default_flour) BETWEEN 1 AND 120),
  default_hydration_pct double precision CHECK (default_hydration_pct > 0 AND default_hydration_pct <= 1000),
  location text NOT NULL DEFAULT 'counter' CHECK (location IN ('counter', 'fridge')),
  started_on date CHECK (started_on >= DATE '1800-01-01'),
  -- Lineage: the culture this one was split from or received as. Deleting the parent keeps the
  -- child. The API keeps it within one account and free of cycles.
  parent_culture_id uuid REFERENCES culture (id) ON DELETE SET NULL CHECK (parent_culture_id <> id),
  archived_at timestamptz,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now()
);

CREATE INDEX culture_account_name_idx ON culture (account_id, lower(name), id);
CREATE INDEX culture_parent_idx ON culture (parent_culture_id) WHERE parent_culture_id IS NOT NULL;

CREATE TABLE feeding (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  culture_id uuid NOT NULL REFERENCES culture (id) ON DELETE CASCADE,
  fed_at timestamptz NOT NULL CHECK (fed_at >= TIMESTAMPTZ '2000-01-01 00:00:00+00'),
  starter_g double precision NOT NULL CHECK (starter_g > 0 AND starter_g <= 20000),
  flour_g double precision NOT NULL CHECK (flour_g > 0 AND flour_g <= 20000),
  water_g double precision NOT NULL CHECK (water_g > 0 AND water_g <= 20000),
  flour text CHECK (length(flour) BETWEEN 1 AND 120),
  water_temperature_c double precision CHECK (water_temperature_c BETWEEN -5 AND 50),
  -- The room's or the jar's temperature at feeding time.
  temperature_c double precision CHECK (temperature_c BETWEEN -5 AND 50),
  -- Height of the starter in the jar right after feeding, from the jar's base.
  initial_height_mm double precision CHECK (initial_height_mm > 0 AND initial_height_mm <= 1000),
  notes text CHECK (length(notes) BETWEEN 1 AND 2000),
  observations text[] NOT NULL DEFAULT '{}' CHECK (
    observations <@ ARRAY['bubbles', 'domed', 'sour-smell', 'yeasty-smell', 'acetone-smell', 'hooch', 'discolouration']
  ),
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now()
);

-- A culture's history, newest first, and its last feeding (the Shelf's "last fed").
CREATE INDEX feeding_culture_fed_at_idx ON feeding (culture_id, fed_at DESC, id DESC);

CREATE TABLE rise_check (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  feeding_id uuid NOT NULL REFERENCES feeding (id) ON DELETE CASCADE,
  taken_at timestamptz NOT NULL CHECK (taken_at >= TIMESTAMPTZ '2000-01-01 00:00:00+00'),
  -- Always stored in mm from the jar's base; "% rise" and "× initial" are converted on the way in.
  height_mm double precision NOT NULL CHECK (height_mm > 0 AND height_mm <= 1000),
  temperature_c double precision CHECK (temperature_c BETWEEN -5 AND 50),
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now()
);

CREATE INDEX rise_check_feeding_taken_at_idx ON rise_check (feeding_id, taken_at, id);

CREATE TABLE temperature_reading (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  feeding_id uuid NOT NULL REFERENCES feeding (id) ON DELETE CASCADE,
  taken_at timestamptz NOT NULL CHECK (taken_at >= TIMESTAMPTZ '2000-01-01 00:00:00+00'),
  temperature_c double precision NOT NULL CHECK (temperature_c BETWEEN -5 AND 50),
  created_at timestamptz NOT NULL DEFAULT now()
);

CREATE INDEX temperature_reading_feeding_taken_at_idx ON temperature_reading (feeding_id, taken_at, id);
