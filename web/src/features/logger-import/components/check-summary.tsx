import Alert from '@mui/material/Alert';
import AlertTitle from '@mui/material/AlertTitle';
import Box from '@mui/material/Box';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import type { LoggerCollection, LoggerReading } from '@peakwise/shared';
import { useEffect, useRef } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { checkedText, readingsText, type LoggerPlace } from '../utils/logger-words';

export interface Checked {
  collection: LoggerCollection;
  /** The readings not already on the feeding or bake: what is sent. */
  fresh: LoggerReading[];
  alreadyThere: number;
}

interface CheckSummaryProps {
  checked: Checked;
  place: LoggerPlace;
  adding: boolean;
  onConfirm: () => void;
  back: string;
}

/** What the whole file gave: counts, the rows that could not be read (by line), and the confirm button. */
export function CheckSummary({ checked, place, adding, onConfirm, back }: CheckSummaryProps) {
  const { collection, fresh, alreadyThere } = checked;
  const ref = useRef<HTMLDivElement>(null);
  // The outcome appears below the button the thumb just pressed; bring it into view.
  useEffect(() => {
    // A block body: newer browsers answer scrollIntoView with a promise, which React would take for a cleanup.
    ref.current?.scrollIntoView({ block: 'start' });
  }, []);
  const unlisted = collection.problemCount - collection.problems.length;

  return (
    <Card component="section" aria-labelledby="logger-check-heading" ref={ref} sx={{ scrollMarginTop: 72 }}>
      <CardContent sx={{ display: 'grid', gap: 2 }}>
        <Typography id="logger-check-heading" variant="h2">
          3. Add the readings
        </Typography>
        <Box component="ul" sx={{ m: 0, pl: 2.5, display: 'grid', gap: 0.5 }} data-testid="logger-check">
          {checkedText(collection, alreadyThere, place).map((line) => (
            <li key={line}>{line}</li>
          ))}
        </Box>
        {collection.problemCount > 0 && (
          <Alert severity="warning" data-testid="logger-problems">
            <AlertTitle>
              {collection.problemCount === 1 ? '1 row' : `${collection.problemCount} rows`} could not be read and will
              be left out
            </AlertTitle>
            <Box component="ul" sx={{ m: 0, pl: 2.5, maxHeight: 240, overflowY: 'auto', overflowWrap: 'anywhere' }}>
              {collection.problems.map((p) => (
                <li key={p.line}>
                  <strong>Line {p.line}:</strong> {p.message}
                </li>
              ))}
              {unlisted > 0 && <li>and {unlisted} more.</li>}
            </Box>
          </Alert>
        )}
        {fresh.length > 0 ? (
          <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
            <Button variant="contained" size="large" onClick={onConfirm} loading={adding} sx={{ minHeight: 56 }}>
              Add {readingsText(fresh.length)}
            </Button>
            <Button component={RouterLink} to={back} variant="outlined" size="large">
              Cancel
            </Button>
          </Stack>
        ) : (
          <Alert severity="info">
            Nothing to add: no reading of this file falls in this {place}’s time, or they are all there already. Check
            the time zone and date format above.
          </Alert>
        )}
      </CardContent>
    </Card>
  );
}
