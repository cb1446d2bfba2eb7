/**
 * Serves a built app directory on localhost for browser tests. Starts on a free port, can
 * be stopped (to prove the app works without a server) and pointed at a new directory
 * (to deploy a changed build while a page is open).
 */
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createStaticHandler } from '../../../scripts/static-handler.mjs';

export interface TestServer {
  url: string;
  port: number;
  /** Serve from another directory from now on (a "deploy"). */
  setRoot(dir: string): void;
  close(): Promise<void>;
}

export async function startServer(root: string, port = 0): Promise<TestServer> {
  let handler = createStaticHandler(root);
  const server: Server = createServer((req, res) => handler(req, res));
  await new Promise<void>((resolve) => server.listen(port, '127.0.0.1', resolve));
  const actual = (server.address() as AddressInfo).port;
  return {
    url: `http://localhost:${actual}`,
    port: actual,
    setRoot(dir) {
      handler = createStaticHandler(dir);
    },
    close: () =>
      new Promise<void>((resolve, reject) => {
        server.closeAllConnections();
        server.close((err) => (err ? reject(err) : resolve()));
      }),
  };
}
