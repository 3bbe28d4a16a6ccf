// Starts the API and client on one port; used by `npm start` and by tests that need a real process.
import type { Server } from 'node:http';
import { createApp } from './app.js';
import { closeContext, createContext } from './create-context.js';
import { readConfig, type Config } from './config.js';
import type { AppContext } from './app-context.js';
import { trackRequests } from './lifecycle/graceful-close.js';
import { removeStaleUploads } from './lifecycle/stale-uploads.js';

export interface RunningServer {
  url: string;
  context: AppContext;
  close(): Promise<void>;
}

export async function startServer(config: Config = readConfig()): Promise<RunningServer> {
  const startedAt = new Date();
  const context = createContext(config);
  const leftOver = await removeStaleUploads(config.UPLOADS_DIR, startedAt);
  if (leftOver) context.logger.info(`removed ${leftOver} partial upload(s) left by an earlier process`);
  const app = createApp(context);
  const server: Server = await new Promise((resolve, reject) => {
    const listening = app.listen(config.VIALYARD_PORT, config.VIALYARD_HOST, () => resolve(listening));
    listening.once('error', reject);
  });
  const drain = trackRequests(server);
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.VIALYARD_PORT;
  return {
    url: `http://${config.VIALYARD_HOST}:${port}`,
    context,
    async close() {
      // Requests under way are answered before the pools end: ending them first fails those requests.
      await drain.close();
      await closeContext(context);
    },
  };
}

// Run directly (node --import tsx api/server.ts): serve until SIGINT/SIGTERM.
if (import.meta.url === `file://${process.argv[1]}`) {
  const running = await startServer();
  running.context.logger.info(`Vialyard listening on ${running.url}`);
  let stopping = false;
  const stop = () => {
    if (stopping) return;
    stopping = true;
    running.context.logger.info('stopping: answering the requests under way');
    void running.close().then(() => process.exit(0), (error: unknown) => {
      running.context.logger.error({ err: error }, 'stopping failed');
      process.exit(1);
    });
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}
