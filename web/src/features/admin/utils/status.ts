/** Said after an admin disables or enables an account. */
export function statusChangedMessage(displayName: string, disabled: boolean): string {
  return disabled
    ? `${displayName} is disabled and has been signed out everywhere.`
    : `${displayName} can sign in again.`;
}
