import Add from '@mui/icons-material/Add';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { CreateCultureForm } from '@/components/logbook/create-culture-form';
import { useCultures } from '@/lib/logbook/get-cultures';
import { CultureCard } from './culture-card';

/** The baker's active cultures at a glance, and the way to add one. */
export function ShelfPage() {
  const cultures = useCultures({ archived: false, sort: 'lastFedAt', limit: 50 });
  const navigate = useNavigate();
  const [adding, setAdding] = useState(false);

  if (cultures.isPending) return <PageLoader />;
  if (cultures.isError) return <LoadError error={cultures.error} onRetry={() => void cultures.refetch()} />;
  const items = cultures.data.items;
  const empty = items.length === 0;

  return (
    <Page title="Shelf" intro={empty ? undefined : 'Your cultures, and when each will be ready.'}>
      {items.map((culture) => (
        <CultureCard key={culture.id} culture={culture} />
      ))}
      {empty || adding ? (
        <Card>
          <CardContent>
            <Typography variant="h2" gutterBottom>
              {empty ? 'Add your first culture' : 'Add a culture'}
            </Typography>
            {empty && (
              <Typography color="text.secondary" sx={{ mb: 2 }}>
                A culture is your starter in its jar. Give it a name; the rest can wait.
              </Typography>
            )}
            <CreateCultureForm others={items} onCreated={(c) => void navigate(`/cultures/${c.id}/feed`)} />
          </CardContent>
        </Card>
      ) : (
        <Button variant="text" startIcon={<Add />} onClick={() => setAdding(true)} sx={{ alignSelf: 'flex-start' }}>
          Add a culture
        </Button>
      )}
    </Page>
  );
}
