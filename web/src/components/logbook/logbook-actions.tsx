import AddCircleOutline from '@mui/icons-material/AddCircleOutlineOutlined';
import Straighten from '@mui/icons-material/Straighten';
import Button from '@mui/material/Button';
import { Link as RouterLink } from 'react-router-dom';

/**
 * The two things a baker does most, as big thumb-sized buttons: log a feeding, add a rise check.
 * A rise check needs a feeding to belong to, so it waits for the first one.
 */
export function LogbookActions({ cultureId, lastFedAt }: { cultureId: string; lastFedAt: string | null }) {
  return (
    <>
      <Button
        component={RouterLink}
        to={`/cultures/${cultureId}/feed`}
        variant="contained"
        size="large"
        fullWidth
        startIcon={<AddCircleOutline />}
      >
        Log feeding
      </Button>
      <Button
        component={RouterLink}
        to={`/cultures/${cultureId}/rise-check`}
        variant="outlined"
        size="large"
        fullWidth
        startIcon={<Straighten />}
        disabled={!lastFedAt}
      >
        Rise check
      </Button>
    </>
  );
}
