import type { AccountExport } from '@peakwise/shared';
import { useMutation } from '@tanstack/react-query';
import { fetchFile, saveFile } from '../utils/download';

/** GET /api/account/export.json → the whole account. Kept as the server's text, so the file is exactly that. */
export async function exportAccount(): Promise<{ text: string; data: AccountExport }> {
  const { text } = await fetchFile('/account/export.json');
  return { text, data: JSON.parse(text) as AccountExport };
}

/** The file name carries the day, so a second download does not overwrite the first. */
export const accountFileName = (exportedAt: string) => `peakwise-export-${exportedAt.slice(0, 10)}.json`;

export function useDownloadAccount() {
  return useMutation({
    mutationFn: exportAccount,
    onSuccess: ({ text, data }) => saveFile(text, accountFileName(data.exportedAt), 'application/json'),
  });
}
