import type { Account, ClassMember } from '@peakwise/shared';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { LoadError } from '@/components/feedback/load-error';
import { useMembers } from '../api/get-members';
import { useRemoveMember } from '../api/remove-member';
import { ConfirmDialog } from './confirm-dialog';

const day = (iso: string, timeZone: string) =>
  new Date(iso).toLocaleDateString('en-GB', { timeZone, day: 'numeric', month: 'short', year: 'numeric' });

/** Who is in the class, and a way to take someone out (their sharing ends at once). */
export function MembersCard({ classId, account }: { classId: string; account: Account }) {
  const members = useMembers(classId, { limit: 100 });
  const remove = useRemoveMember(classId);
  const [removing, setRemoving] = useState<ClassMember | null>(null);

  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          Students
        </Typography>
        {members.isError && <LoadError error={members.error} onRetry={() => void members.refetch()} />}
        {members.data && members.data.items.length === 0 && (
          <Typography color="text.secondary">Nobody has joined yet.</Typography>
        )}
        {members.data && members.data.items.length > 0 && (
          <List aria-label="Students in the class">
            {members.data.items.map((m) => (
              <ListItem
                key={m.id}
                divider
                disableGutters
                secondaryAction={
                  <Button size="small" color="error" onClick={() => setRemoving(m)}>
                    Remove
                  </Button>
                }
              >
                <ListItemText
                  primary={m.displayName}
                  secondary={`${m.email} · joined ${day(m.joinedAt, account.timeZone)}`}
                  slotProps={{ secondary: { sx: { overflowWrap: 'anywhere', pr: 9 } } }}
                />
              </ListItem>
            ))}
          </List>
        )}
        {members.data && members.data.total > members.data.items.length && (
          <Typography color="text.secondary">
            Showing {members.data.items.length} of {members.data.total}.
          </Typography>
        )}
      </CardContent>
      <ConfirmDialog
        open={removing !== null}
        title={`Remove ${removing?.displayName ?? 'the student'}?`}
        confirmLabel="Remove"
        pending={remove.isPending}
        error={remove.error}
        onClose={() => {
          remove.reset();
          setRemoving(null);
        }}
        onConfirm={() => removing && remove.mutate(removing.id, { onSuccess: () => setRemoving(null) })}
      >
        <Typography>
          You stop seeing their logs at once. Their cultures, feedings and bakes stay theirs; they can join again with a
          new invitation or the join code.
        </Typography>
      </ConfirmDialog>
    </Card>
  );
}
