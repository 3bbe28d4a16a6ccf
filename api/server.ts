// Starts the API and client on one port; used by `npm start` and by tests that need a real process.
import type { Server } from 'node:http';
import { createApp } from './app.js';
import { closeContext, createContext } from './create-context.js';
import { readConfig, type Config } from './config.js';
import type { AppContext } from './app-context.js';

export interface RunningServer {
  url: string;
  context: AppContext;
  close(): Promise<void>;
}

export async function startServer(config: Config = readConfig()): Promise<RunningServer> {
  const context = createContext(config);
  const app = createApp(context);
  const server: Server = await new Promise((resolve, reject) => {
    const listening = app.listen(config.VIALYARD_PORT, config.VIALYARD_HOST, () => resolve(listening));
    listening.once('error', reject);
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.VIALYARD_PORT;
  return {
    url: `http://${config.VIALYARD_HOST}:${port}`,
    context,
    async close() {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeAllConnections();
      await closeContext(context);
    },
  };
}

// Run directly (node --import tsx api/server.ts): serve until SIGINT/SIGTERM.
if (import.meta.url === `file://${process.argv[1]}`) {
  const running = await startServer();
  running.context.logger.info(`Vialyard listening on ${running.url}`);
  const stop = () => running.close().then(() => process.exit(0));
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}
