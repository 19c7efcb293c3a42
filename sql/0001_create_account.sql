-- A person who signs in. E-mail is stored lower-cased so the unique constraint is case-blind.
CREATE TABLE account (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  email text NOT NULL UNIQUE CHECK (email = lower(email)),
  display_name text NOT NULL CHECK (length(display_name) BETWEEN 1 AND 80),
  -- scrypt parameters, salt and key in one self-describing string (see password.service.ts).
  password_hash text NOT NULL,
  role text NOT NULL DEFAULT 'baker' CHECK (role IN ('baker', 'instructor', 'admin')),
  unit_system text NOT NULL DEFAULT 'metric' CHECK (unit_system IN ('metric', 'us')),
  temperature_unit text NOT NULL DEFAULT 'C' CHECK (temperature_unit IN ('C', 'F')),
  time_zone text NOT NULL DEFAULT 'UTC',
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now()
);
