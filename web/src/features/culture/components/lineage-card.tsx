import type { Culture } from '@peakwise/shared';
import CallSplit from '@mui/icons-material/CallSplit';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Dialog from '@mui/material/Dialog';
import DialogContent from '@mui/material/DialogContent';
import DialogTitle from '@mui/material/DialogTitle';
import Link from '@mui/material/Link';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router-dom';
import { CreateCultureForm } from '@/components/logbook/create-culture-form';
import { useCultures } from '@/lib/logbook/get-cultures';

/** Where the culture came from, what came from it, and a way to split it. */
export function LineageCard({ culture }: { culture: Culture }) {
  const all = useCultures({ limit: 200, sort: 'name' });
  const navigate = useNavigate();
  const [splitting, setSplitting] = useState(false);
  const items = all.data?.items ?? [];
  const parent = items.find((c) => c.id === culture.parentCultureId);
  const children = items.filter((c) => c.parentCultureId === culture.id);

  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          Lineage
        </Typography>
        <Typography>
          {culture.parentCultureId ? (
            <>
              Descends from{' '}
              <Link component={RouterLink} to={`/cultures/${culture.parentCultureId}`}>
                {parent?.name ?? 'its parent culture'}
              </Link>
              .
            </>
          ) : (
            'Started here: no parent culture recorded.'
          )}
        </Typography>
        {children.length > 0 && (
          <Typography sx={{ mt: 1 }}>
            Passed on to{' '}
            {children.map((c, i) => (
              <span key={c.id}>
                {i > 0 && ', '}
                <Link component={RouterLink} to={`/cultures/${c.id}`}>
                  {c.name}
                </Link>
              </span>
            ))}
            .
          </Typography>
        )}
        <Button startIcon={<CallSplit />} variant="outlined" sx={{ mt: 2 }} onClick={() => setSplitting(true)}>
          Split this culture
        </Button>
      </CardContent>
      <Dialog open={splitting} onClose={() => setSplitting(false)} fullWidth maxWidth="sm">
        <DialogTitle>Split {culture.name}</DialogTitle>
        <DialogContent sx={{ pt: 1 }}>
          <Typography color="text.secondary" sx={{ mb: 2 }}>
            A new culture from a spoonful of this one, to keep or pass on.
          </Typography>
          <CreateCultureForm
            others={items.filter((c) => c.id !== culture.id).concat(culture)}
            parent={culture}
            submitLabel="Create the new culture"
            onCreated={(c) => {
              setSplitting(false);
              void navigate(`/cultures/${c.id}`);
            }}
          />
        </DialogContent>
      </Dialog>
    </Card>
  );
}
