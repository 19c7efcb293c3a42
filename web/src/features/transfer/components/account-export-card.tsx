import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import Alert from '@mui/material/Alert';
import Button from '@mui/material/Button';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import Typography from '@mui/material/Typography';
import { isApiError } from '@/lib/api-client';
import { accountFileName, useDownloadAccount } from '../api/export-account';
import { checksText, feedingsText } from '../utils/import-words';
import { SiNote } from './si-note';

const culturesText = (n: number) => `${n} ${n === 1 ? 'culture' : 'cultures'}`;

/** Everything the account holds, in one file the baker keeps. */
export function AccountExportCard() {
  const download = useDownloadAccount();
  const saved = download.data?.data;
  return (
    <Card component="section" aria-labelledby="your-data-heading">
      <CardContent sx={{ display: 'grid', gap: 1.5 }}>
        <Typography id="your-data-heading" variant="h2">
          Your data
        </Typography>
        <Typography>
          Your profile, cultures, feedings, rise checks and temperature readings in one JSON file.
        </Typography>
        <SiNote />
        <Button
          variant="outlined"
          size="large"
          startIcon={<FileDownloadOutlined />}
          loading={download.isPending}
          onClick={() => download.mutate()}
          sx={{ justifySelf: { xs: 'stretch', sm: 'start' } }}
        >
          Download all my data (JSON)
        </Button>
        {download.isError && (
          <Alert severity="error" role="alert">
            {isApiError(download.error) ? download.error.message : 'The file could not be saved. Please try again.'}
          </Alert>
        )}
        {saved && (
          <Typography variant="body2" role="status">
            Saved {accountFileName(saved.exportedAt)}: {culturesText(saved.cultures.length)},{' '}
            {feedingsText(saved.feedings.length)}, {checksText(saved.riseChecks.length)}.
          </Typography>
        )}
      </CardContent>
    </Card>
  );
}
