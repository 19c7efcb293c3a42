import type { Account, BakePlanStatus } from '@peakwise/shared';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Chip from '@mui/material/Chip';
import List from '@mui/material/List';
import ListItemButton from '@mui/material/ListItemButton';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { useStudentPlans } from '../api/get-student-plans';

const STATUS: Record<BakePlanStatus, string> = { active: 'On the bench', finished: 'Baked', cancelled: 'Cancelled' };

/** The student's bakes, each opening its read-only plan (where comments go). */
export function StudentBakesCard({
  classId,
  studentId,
  studentName,
  account,
}: {
  classId: string;
  studentId: string;
  studentName: string;
  account: Account;
}) {
  const plans = useStudentPlans(classId, studentId, { limit: 20 });
  const when = (iso: string) =>
    new Date(iso).toLocaleString('en-GB', { timeZone: account.timeZone, dateStyle: 'medium', timeStyle: 'short' });
  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          {studentName}’s bakes
        </Typography>
        {plans.isError && <LoadError error={plans.error} onRetry={() => void plans.refetch()} />}
        {plans.data && plans.data.items.length === 0 && (
          <Typography color="text.secondary">No bakes planned yet.</Typography>
        )}
        {plans.data && plans.data.items.length > 0 && (
          <List aria-label="Bakes" disablePadding>
            {plans.data.items.map((p) => (
              <ListItemButton key={p.id} component={RouterLink} to={`/classes/${classId}/plans/${p.id}`} divider>
                <ListItemText
                  primary={p.name}
                  secondary={[
                    p.formulaName,
                    p.cultureName ? `with ${p.cultureName}` : null,
                    p.readyAt ? `ready ${when(p.readyAt)}` : `planned ${when(p.createdAt)}`,
                  ]
                    .filter(Boolean)
                    .join(' · ')}
                />
                <Chip size="small" label={STATUS[p.status]} variant="outlined" sx={{ ml: 1 }} />
              </ListItemButton>
            ))}
          </List>
        )}
      </CardContent>
    </Card>
  );
}
