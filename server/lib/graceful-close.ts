import type http from 'node:http';

/**
 * Stops an HTTP server the way a rolling restart needs: no new connections, idle kept-alive ones closed at once,
 * requests in flight allowed to finish (a save is not cut halfway), and whatever still runs after `graceMs` cut.
 * Resolves once the server is closed; `cut` says whether connections had to be cut.
 */
export async function gracefulClose(server: http.Server, graceMs = 10_000): Promise<{ cut: boolean }> {
  if (!server.listening) return { cut: false };
  const closed = new Promise<void>((resolve) => server.close(() => resolve()));
  // A kept-alive connection whose request finishes after this stays open until its keep-alive timeout: close the
  // idle ones again as requests finish.
  server.closeIdleConnections();
  const sweep = setInterval(() => server.closeIdleConnections(), 50);
  let timer: NodeJS.Timeout | undefined;
  const late = new Promise<'late'>((resolve) => (timer = setTimeout(() => resolve('late'), graceMs)));
  const first = await Promise.race([closed.then(() => 'closed' as const), late]);
  clearTimeout(timer);
  clearInterval(sweep);
  if (first === 'closed') return { cut: false };
  server.closeAllConnections();
  await closed;
  return { cut: true };
}
