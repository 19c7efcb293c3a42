import type { Account, BakingClass } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardActions from '@mui/material/CardActions';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { classWeek, classWeekWords, formatClassDates, todayIn } from '../utils/class-dates';

interface ClassListProps {
  classes: BakingClass[];
  account: Account;
  now: Date;
  onLeave: (bakingClass: BakingClass) => void;
}

const students = (n: number) => (n === 1 ? '1 student' : `${n} students`);

/** One card per class: what it is, when, the viewer's part in it. */
export function ClassList({ classes, account, now, onLeave }: ClassListProps) {
  const today = todayIn(account.timeZone, now);
  return (
    <Stack spacing={2} component="ul" sx={{ listStyle: 'none', p: 0, m: 0 }} aria-label="Your classes">
      {classes.map((c) => {
        const teaching = c.role === 'instructor';
        return (
          <Card component="li" key={c.id}>
            <CardActionArea component={RouterLink} to={`/classes/${c.id}`}>
              <CardContent>
                <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap', rowGap: 0.5 }}>
                  <Typography variant="h2" component="h2">
                    {c.name}
                  </Typography>
                  <Chip
                    size="small"
                    label={teaching ? 'You teach' : 'Student'}
                    color={teaching ? 'primary' : 'default'}
                    variant={teaching ? 'filled' : 'outlined'}
                  />
                </Stack>
                <Typography sx={{ mt: 1 }}>
                  {classWeekWords(classWeek(c.startsOn, c.endsOn, today))} · {formatClassDates(c.startsOn, c.endsOn)}
                </Typography>
                <Typography color="text.secondary">
                  {teaching ? students(c.memberCount) : `Taught by ${c.instructor.displayName}`}
                </Typography>
              </CardContent>
            </CardActionArea>
            {!teaching && (
              <CardActions sx={{ justifyContent: 'flex-end' }}>
                <Button color="error" onClick={() => onLeave(c)}>
                  Leave
                </Button>
              </CardActions>
            )}
          </Card>
        );
      })}
    </Stack>
  );
}
