import Add from '@mui/icons-material/Add';
import ThermostatOutlined from '@mui/icons-material/ThermostatOutlined';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardActionArea from '@mui/material/CardActionArea';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { LoadError } from '@/components/feedback/load-error';
import { PageLoader } from '@/components/feedback/page-loader';
import { Page } from '@/components/layout/page';
import { useFormulas } from '../api/get-formulas';

const PAGE = 20;

/** The baker's saved formulas (private), newest change first, and the way to a new one. */
export function FormulaListPage() {
  const [limit, setLimit] = useState(PAGE);
  const formulas = useFormulas({ limit });

  if (formulas.isPending) return <PageLoader />;
  if (formulas.isError) return <LoadError error={formulas.error} onRetry={() => void formulas.refetch()} />;
  const { items, total } = formulas.data;

  return (
    <Page title="Formula" intro="Your formulas in baker’s percentages. Private to you.">
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap', rowGap: 1 }}>
        <Button component={RouterLink} to="/formulas/new" variant="contained" size="large" startIcon={<Add />}>
          New formula
        </Button>
        <Button component={RouterLink} to="/formulas/water-temperature" size="large" startIcon={<ThermostatOutlined />}>
          Water temperature
        </Button>
      </Stack>
      {items.length === 0 && (
        <Typography color="text.secondary">
          No formulas yet. Start one from a recipe — by weight or by cups and spoons — and Peakwise weighs it for you.
        </Typography>
      )}
      <Stack spacing={1.5} component="ul" sx={{ listStyle: 'none', p: 0, m: 0 }}>
        {items.map((f) => (
          <li key={f.id}>
            <Card data-testid="formula-card">
              <CardActionArea component={RouterLink} to={`/formulas/${f.id}`}>
                <CardContent>
                  <Typography variant="h3" component="h2">
                    {f.name}
                  </Typography>
                  <Typography variant="body2" color="text.secondary">
                    {f.ingredientCount} {f.ingredientCount === 1 ? 'ingredient' : 'ingredients'} · changed{' '}
                    {new Date(f.updatedAt).toLocaleDateString(undefined, {
                      day: 'numeric',
                      month: 'short',
                      year: 'numeric',
                    })}
                  </Typography>
                </CardContent>
              </CardActionArea>
            </Card>
          </li>
        ))}
      </Stack>
      {total > items.length && (
        <Button onClick={() => setLimit((l) => Math.min(200, l + PAGE))} sx={{ alignSelf: 'flex-start' }}>
          Show more ({total - items.length} more)
        </Button>
      )}
    </Page>
  );
}
