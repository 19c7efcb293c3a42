import DeleteOutlined from '@mui/icons-material/DeleteOutlined';
import Button from '@mui/material/Button';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { FormAlert } from '@/components/form/form-alert';
import { useDeleteFormula } from '../api/delete-formula';

/** Deleting asks once more in place: a formula cannot be brought back. */
export function DeleteFormulaButton({ formulaId, name }: { formulaId: string; name: string }) {
  const [asking, setAsking] = useState(false);
  const remove = useDeleteFormula();
  const navigate = useNavigate();

  if (!asking) {
    return (
      <Button
        color="error"
        startIcon={<DeleteOutlined />}
        onClick={() => setAsking(true)}
        sx={{ alignSelf: 'flex-start' }}
      >
        Delete formula
      </Button>
    );
  }
  return (
    <Stack spacing={1}>
      <Typography>Delete “{name}” for good?</Typography>
      <Stack direction="row" spacing={1}>
        <Button
          variant="contained"
          color="error"
          loading={remove.isPending}
          onClick={() => remove.mutate(formulaId, { onSuccess: () => void navigate('/formulas', { replace: true }) })}
        >
          Delete
        </Button>
        <Button onClick={() => setAsking(false)}>Keep it</Button>
      </Stack>
      <FormAlert message={remove.error ? 'The formula could not be deleted. Try again.' : undefined} />
    </Stack>
  );
}
