import { useMutation } from '@tanstack/react-query';
import { fetchFile, saveFile } from '../utils/download';

/** GET /api/cultures/:id/export.csv → the culture's feedings and rise checks as a CSV attachment. */
export async function exportCultureCsv(cultureId: string): Promise<{ fileName: string; text: string }> {
  const { text, fileName } = await fetchFile(`/cultures/${encodeURIComponent(cultureId)}/export.csv`);
  return { text, fileName: fileName ?? 'culture-feedings.csv' };
}

/** Downloading is a one-off action the baker starts, so a mutation (pending, error) rather than a query. */
export function useDownloadCultureCsv(cultureId: string) {
  return useMutation({
    mutationFn: () => exportCultureCsv(cultureId),
    onSuccess: ({ text, fileName }) => saveFile(text, fileName, 'text/csv;charset=utf-8'),
  });
}
