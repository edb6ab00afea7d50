/**
 * Call `stop` once the process that started this one is gone. A parent killed outright (a crash,
 * SIGKILL, a closed terminal) cannot stop its children, and an orphan would keep its port and
 * state against the next start. Used by the start command and by every fake.
 */
export function whenParentExits(stop: () => void): void {
  const parent = process.ppid;
  setInterval(() => {
    if (process.ppid !== parent) stop();
  }, 500).unref();
}
