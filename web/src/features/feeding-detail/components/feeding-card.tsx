import type { Account, Feeding } from '@peakwise/shared';
import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import EditOutlined from '@mui/icons-material/EditOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { EditFeedingForm } from './edit-feeding-form';
import { FeedingRecord } from './feeding-record';

interface FeedingCardProps {
  feeding: Feeding;
  account: Account;
  onDelete: () => void;
}

/** The feeding as recorded, turning into its form to correct a slip. */
export function FeedingCard({ feeding, account, onDelete }: FeedingCardProps) {
  const [editing, setEditing] = useState(false);
  const [saved, setSaved] = useState(false);
  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          {editing ? 'Correct this feeding' : 'As recorded'}
        </Typography>
        {editing ? (
          <EditFeedingForm
            feeding={feeding}
            account={account}
            onSaved={() => {
              setEditing(false);
              setSaved(true);
            }}
            onCancel={() => setEditing(false)}
          />
        ) : (
          <>
            {saved && (
              <Alert severity="success" sx={{ mb: 2 }} onClose={() => setSaved(false)}>
                Saved. The culture’s forecast now uses the corrected feeding.
              </Alert>
            )}
            <FeedingRecord feeding={feeding} account={account} />
            <Stack direction="row" spacing={1} sx={{ mt: 2.5, flexWrap: 'wrap', gap: 1 }}>
              <Button
                variant="contained"
                startIcon={<EditOutlined />}
                onClick={() => {
                  setSaved(false);
                  setEditing(true);
                }}
                sx={{ flex: 1 }}
              >
                Edit feeding
              </Button>
              <Button
                variant="outlined"
                color="error"
                startIcon={<DeleteOutlined />}
                onClick={onDelete}
                sx={{ flex: 1 }}
              >
                Delete feeding
              </Button>
            </Stack>
          </>
        )}
      </CardContent>
    </Card>
  );
}
