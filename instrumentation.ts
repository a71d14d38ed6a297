/** Runs once when a server process starts (Next's instrumentation hook). */
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { sweepStaleTemps } = await import('./lib/storage');
  const { log } = await import('./lib/log');
  const removed = await sweepStaleTemps().catch((err: unknown) => {
    log.warn({ err }, 'could not sweep stale upload temp files');
    return 0;
  });
  if (removed) log.info({ removed }, 'removed stale upload temp files');
}
