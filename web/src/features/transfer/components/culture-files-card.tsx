import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import UploadFileOutlined from '@mui/icons-material/UploadFileOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Stack from '@mui/material/Stack';
import Typography from '@mui/material/Typography';
import { Link as RouterLink } from 'react-router-dom';
import { isApiError } from '@/lib/api-client';
import { useDownloadCultureCsv } from '../api/export-culture-csv';
import { SiNote } from './si-note';

/** The culture's logbook as a spreadsheet file: out to keep, in from a log kept elsewhere. */
export function CultureFilesCard({ cultureId }: { cultureId: string }) {
  const download = useDownloadCultureCsv(cultureId);
  return (
    <Card component="section" aria-labelledby="culture-files-heading" data-testid="culture-files">
      <CardContent sx={{ display: 'grid', gap: 1.5 }}>
        <Typography id="culture-files-heading" variant="h2">
          Files
        </Typography>
        <Typography>
          Feedings and rise checks as a CSV spreadsheet: keep a copy, or bring in a logbook you kept elsewhere.
        </Typography>
        <SiNote />
        <Stack direction={{ xs: 'column', sm: 'row' }} spacing={1.5}>
          <Button
            variant="outlined"
            size="large"
            startIcon={<FileDownloadOutlined />}
            loading={download.isPending}
            onClick={() => download.mutate()}
          >
            Download CSV
          </Button>
          <Button
            component={RouterLink}
            to={`/cultures/${cultureId}/import`}
            variant="outlined"
            size="large"
            startIcon={<UploadFileOutlined />}
          >
            Import from CSV
          </Button>
        </Stack>
        {download.isError && (
          <Alert severity="error" role="alert">
            {isApiError(download.error) ? download.error.message : 'The file could not be saved. Please try again.'}
          </Alert>
        )}
        {download.isSuccess && (
          <Typography variant="body2" role="status">
            Saved {download.data.fileName}.
          </Typography>
        )}
      </CardContent>
    </Card>
  );
}
