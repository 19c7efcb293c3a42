import { FEEDING_OBSERVATIONS, type FeedingObservation } from '@peakwise/shared';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';

export const OBSERVATION_LABELS: Record<FeedingObservation, string> = {
  bubbles: 'Bubbles',
  domed: 'Domed top',
  'sour-smell': 'Sour smell',
  'yeasty-smell': 'Yeasty smell',
  'acetone-smell': 'Acetone smell',
  hooch: 'Hooch (liquid on top)',
  discolouration: 'Discolouration',
};

interface ObservationChipsProps {
  value: FeedingObservation[];
  onChange: (value: FeedingObservation[]) => void;
}

/** Toggle chips, big enough for a thumb; selected ones are filled. */
export function ObservationChips({ value, onChange }: ObservationChipsProps) {
  const toggle = (o: FeedingObservation) => onChange(value.includes(o) ? value.filter((v) => v !== o) : [...value, o]);
  return (
    <Stack direction="row" sx={{ flexWrap: 'wrap', gap: 1 }} role="group" aria-label="What you noticed">
      {FEEDING_OBSERVATIONS.map((o) => {
        const on = value.includes(o);
        return (
          <Chip
            key={o}
            label={OBSERVATION_LABELS[o]}
            clickable
            color={on ? (o === 'discolouration' ? 'error' : 'primary') : 'default'}
            variant={on ? 'filled' : 'outlined'}
            aria-pressed={on}
            onClick={() => toggle(o)}
            sx={{ height: 40, fontSize: '0.95rem' }}
          />
        );
      })}
    </Stack>
  );
}
