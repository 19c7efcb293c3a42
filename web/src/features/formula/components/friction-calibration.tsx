import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import InputAdornment from '@mui/material/InputAdornment';
import Stack from '@mui/material/Stack';
import TextField from '@mui/material/TextField';
import Typography from '@mui/material/Typography';
import type { TemperatureUnit } from '@peakwise/shared';
import { useState } from 'react';
import { frictionFrom, type CalibrationValues } from '../utils/water-temperature';

interface FrictionCalibrationProps {
  unit: TemperatureUnit;
  withPreferment: boolean;
  onUse: (friction: number) => void;
}

/** Your mixer's own friction factor, from one past bake whose dough temperature you measured. */
export function FrictionCalibration({ unit, withPreferment, onUse }: FrictionCalibrationProps) {
  const [values, setValues] = useState<CalibrationValues>({
    room: '',
    flour: '',
    preferment: '',
    water: '',
    dough: '',
  });
  const result = frictionFrom(values, withPreferment, unit);
  const deg = `°${unit}`;
  const field = (name: keyof CalibrationValues, label: string) => (
    <TextField
      label={label}
      value={values[name]}
      onChange={(e) => setValues((v) => ({ ...v, [name]: e.target.value }))}
      slotProps={{
        htmlInput: { inputMode: 'decimal', 'aria-label': `Past bake: ${label.toLowerCase()}` },
        input: { endAdornment: <InputAdornment position="end">{deg}</InputAdornment> },
      }}
    />
  );
  const rounded = result ? Math.round(result.friction * 10) / 10 : null;

  return (
    <Card>
      <CardContent>
        <Stack spacing={2}>
          <div>
            <Typography variant="h2">Calibrate from a past bake</Typography>
            <Typography variant="body2" color="text.secondary">
              The temperatures of that day, and the dough’s right after mixing.
            </Typography>
          </div>
          <Stack direction="row" spacing={1}>
            {field('room', 'Room')}
            {field('flour', 'Flour')}
          </Stack>
          <Stack direction="row" spacing={1}>
            {field('water', 'Water used')}
            {withPreferment ? field('preferment', 'Levain') : null}
          </Stack>
          {field('dough', 'Dough after mixing')}
          {result && rounded !== null && (
            <Stack spacing={1}>
              <Typography data-testid="calibrated-friction" sx={{ fontWeight: 500 }}>
                Your friction factor: {rounded} {deg}
              </Typography>
              {result.warnings.map((w) => (
                <Typography key={w.code} color="warning.main" variant="body2">
                  {w.message}
                </Typography>
              ))}
              <Button variant="outlined" onClick={() => onUse(result.friction)} sx={{ alignSelf: 'flex-start' }}>
                Use {rounded} {deg} above
              </Button>
            </Stack>
          )}
        </Stack>
      </CardContent>
    </Card>
  );
}
