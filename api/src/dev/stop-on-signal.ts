/** A fake service's process ends cleanly on Ctrl-C or SIGTERM (from npm start / npm test), once. */
export function stopOnSignal(close: () => Promise<void>): void {
  let closing = false;
  const stop = (): void => {
    if (closing) return;
    closing = true;
    void close().then(() => process.exit(0));
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
