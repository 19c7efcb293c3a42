import { CLASS_SHARING_TERMS, type BakingClass } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { LeaveClassDialog } from './leave-class-dialog';

/** What a student sees of their class: who teaches it, what is shared, and the way out. */
export function StudentClassView({ bakingClass }: { bakingClass: BakingClass }) {
  const navigate = useNavigate();
  const [leaving, setLeaving] = useState(false);
  return (
    <>
      <Card>
        <CardContent>
          <Typography variant="h2" gutterBottom>
            Taught by {bakingClass.instructor.displayName}
          </Typography>
          {bakingClass.description && (
            <Typography sx={{ whiteSpace: 'pre-line' }}>{bakingClass.description}</Typography>
          )}
        </CardContent>
      </Card>
      <Card>
        <CardContent>
          <Typography variant="h2" gutterBottom>
            What you share
          </Typography>
          <ul style={{ margin: 0, paddingInlineStart: '1.2em' }}>
            {CLASS_SHARING_TERMS.map((t) => (
              <li key={t}>
                <Typography>{t}</Typography>
              </li>
            ))}
          </ul>
          <Button color="error" variant="outlined" sx={{ mt: 2 }} onClick={() => setLeaving(true)}>
            Leave class
          </Button>
        </CardContent>
      </Card>
      <LeaveClassDialog
        bakingClass={leaving ? bakingClass : null}
        onClose={() => setLeaving(false)}
        onLeft={() => void navigate('/classes', { replace: true })}
      />
    </>
  );
}
