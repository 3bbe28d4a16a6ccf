// Stops an HTTP server the way a SIGTERM should: no new connections, requests under way answered, idle keep-alive
// connections closed, and only then the caller ends the database pools (ending them first fails the open requests).
import type { Server } from 'node:http';

export interface Drain {
  /** Resolves once every open request has been answered, or after `timeoutMs` (then the rest are cut). */
  close(timeoutMs?: number): Promise<void>;
  inFlight(): number;
}

export function trackRequests(server: Server): Drain {
  let open = 0;
  let closing = false;
  let settled: (() => void) | undefined;
  // Before the app's own listener, so the header is set before any answer starts.
  server.prependListener('request', (_req, res) => {
    open++;
    // While closing, each answer ends its connection, so a keep-alive client cannot keep the server open.
    if (closing) res.setHeader('Connection', 'close');
    // A request is done when its handler ends the answer, not when the socket closes: a client that gives up (a load
    // test stopping, a closed tab) leaves its handler running, still querying the database.
    const end = res.end;
    let ended = false;
    // Counted out once the answer is handed to the socket (or the socket is gone), so cutting connections loses nothing.
    const countOut = () => {
      open--;
      if (!closing) return;
      server.closeIdleConnections();
      if (open === 0) settled?.();
    };
    res.end = function (this: typeof res, ...args: Parameters<typeof end>) {
      const result = end.apply(this, args);
      if (!ended) {
        ended = true;
        let counted = false;
        const once = () => {
          if (counted) return;
          counted = true;
          setImmediate(countOut);
        };
        if (!res.socket || res.socket.destroyed || res.writableFinished) once();
        res.once('finish', once);
        res.once('close', once);
      }
      return result;
    } as typeof end;
  });
  return {
    inFlight: () => open,
    async close(timeoutMs = 8_000) {
      closing = true;
      const listenerClosed = new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeIdleConnections();
      if (open > 0) {
        await new Promise<void>((resolve) => {
          const timer = setTimeout(resolve, timeoutMs);
          settled = () => {
            clearTimeout(timer);
            resolve();
          };
        });
      }
      server.closeAllConnections();
      await listenerClosed;
    },
  };
}
