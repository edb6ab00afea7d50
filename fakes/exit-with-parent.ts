/**
 * Stop a fake once the process that started it is gone. A start command killed outright (a
 * crash, SIGKILL, a closed terminal) cannot stop its fakes, and an orphaned fake would keep its
 * port and old state against the next start.
 */
export function exitWithParent(stop: () => void): void {
  const parent = process.ppid;
  setInterval(() => {
    if (process.ppid !== parent) stop();
  }, 500).unref();
}
