import { formatTemperature, type Account, type Feeding } from '@peakwise/shared';
import Alert from '@mui/material/Alert';
import { DISCOLOURATION_CAUTION } from '@/components/logbook/cautions';
import { OBSERVATION_LABELS } from '@/components/logbook/observation-chips';
import { formatHeight, formatWeights } from '@/lib/format/units';
import { feedHydrationWords, formatWhen, ratioWords } from '../utils/feeding-words';
import { FactList } from './fact-list';

const NONE = '—';

/** The feeding as it was logged, in the baker's units, with the caution a discoloured jar calls for. */
export function FeedingRecord({
  feeding: f,
  account,
  readOnly = false,
}: {
  feeding: Feeding;
  account: Account;
  /** Someone else's feeding (an instructor's view): "you" is not the reader. */
  readOnly?: boolean;
}) {
  const temperature = (c: number | null) => (c === null ? NONE : formatTemperature(c, account.temperatureUnit, 1));
  const grams = [f.starterG, f.flourG, f.waterG];
  const facts = [
    { label: 'Fed at', value: formatWhen(f.fedAt, account.timeZone) },
    {
      label: 'Starter : flour : water',
      value: [
        formatWeights(grams, account.unitSystem),
        // The form takes grams in both unit systems, so a US baker sees the numbers they will edit.
        account.unitSystem === 'us' ? `(${formatWeights(grams, 'metric')})` : null,
        `ratio ${ratioWords(f)}`,
      ]
        .filter(Boolean)
        .join('\n'),
    },
    { label: 'Feed hydration', value: `${feedHydrationWords(f)} water to flour` },
    { label: 'Flour', value: f.flour ?? NONE },
    { label: 'Room or jar temperature', value: temperature(f.temperatureC) },
    ...(f.waterTemperatureC === null ? [] : [{ label: 'Water temperature', value: temperature(f.waterTemperatureC) }]),
    {
      label: 'Height after feeding',
      value: f.initialHeightMm === null ? NONE : formatHeight(f.initialHeightMm, account.unitSystem),
    },
    {
      label: readOnly ? 'What the baker noticed' : 'What you noticed',
      value:
        f.observations.length === 0 ? 'Nothing noted' : f.observations.map((o) => OBSERVATION_LABELS[o]).join(', '),
    },
    { label: 'Notes', value: f.notes ?? NONE },
  ];
  return (
    <>
      <FactList facts={facts} />
      {f.observations.includes('discolouration') && (
        <Alert severity="error" role="alert" sx={{ mt: 2 }}>
          {DISCOLOURATION_CAUTION}
        </Alert>
      )}
    </>
  );
}
