import { ConfirmDialog } from './confirm-dialog';

interface DeleteConfirmProps<T extends { id: string }> {
  /** The entry the baker asked to delete; null keeps the dialog closed. */
  entry: T | null;
  title: string;
  confirmLabel: string;
  /** What goes, in words the baker recognises (its time, its value). */
  describe: (entry: T) => string;
  remove: (id: string) => Promise<unknown>;
  onClose: () => void;
}

/** Asks before one reading of the feeding (a rise check, a temperature) is deleted. */
export function DeleteConfirm<T extends { id: string }>({
  entry,
  title,
  confirmLabel,
  describe,
  remove,
  onClose,
}: DeleteConfirmProps<T>) {
  return (
    <ConfirmDialog
      open={entry !== null}
      title={title}
      confirmLabel={confirmLabel}
      onConfirm={() => remove(entry!.id)}
      onClose={onClose}
    >
      {entry && describe(entry)}
    </ConfirmDialog>
  );
}
