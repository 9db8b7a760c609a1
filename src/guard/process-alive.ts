/**
 * Whether a process of this machine is still running: signal 0 tests for it without touching it.
 * EPERM means it exists but belongs to another user.
 */
export function isProcessAlive(pid: number): boolean {
  if (pid === process.pid) return true;
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}
