/**
 * A Chromium we start ourselves (not through playwright's launcher), so a test can kill it
 * the way a crash or the phone's out-of-memory killer does: SIGKILL to the whole process
 * group, with no chance to flush anything. It runs detached in its own process group, with
 * a persistent profile directory and a DevTools port; playwright-core connects over CDP.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { chromium, type Browser, type BrowserContext } from 'playwright-core';
import { CHROMIUM_FLAGS, PHONE, findChromium } from './browser.js';

export interface SpawnedBrowser {
  browser: Browser;
  /** The profile's default context (persistent: its storage is on disk). */
  context: BrowserContext;
  /** Process id of the browser, which leads its process group. */
  pid: number;
  /** SIGKILL the whole process group and wait until every process in it is gone. */
  kill(): Promise<void>;
  /** Closes the browser normally (flushes the profile). */
  close(): Promise<void>;
}

/** True while any process of the group `pgid` is alive. */
function groupAlive(pgid: number): boolean {
  try {
    process.kill(-pgid, 0);
    return true;
  } catch {
    return false;
  }
}

/** Waits for the "DevTools listening on ws://…" line Chromium prints on stderr. */
function devToolsEndpoint(child: ChildProcess, timeoutMs: number): Promise<string> {
  return new Promise((resolve, reject) => {
    let text = '';
    const timer = setTimeout(
      () => reject(new Error(`Chromium printed no DevTools address in ${timeoutMs} ms:\n${text}`)),
      timeoutMs,
    );
    const onData = (chunk: Buffer) => {
      text += chunk.toString('utf8');
      const m = /DevTools listening on (ws:\/\/\S+)/.exec(text);
      if (m?.[1]) {
        clearTimeout(timer);
        child.stderr?.off('data', onData);
        child.stderr?.resume(); // keep draining, or a full pipe would stall Chromium
        resolve(m[1]);
      }
    };
    child.stderr?.on('data', onData);
    child.once('exit', (code, signal) => {
      clearTimeout(timer);
      reject(new Error(`Chromium exited (${code ?? signal}) before it was ready:\n${text}`));
    });
  });
}

/**
 * Starts Chromium detached on `userDataDir` with a DevTools port chosen by the browser
 * (`--remote-debugging-port=0`), and connects to it.
 */
export async function spawnChromium(
  userDataDir: string,
  options: { viewport?: { width: number; height: number }; extraArgs?: string[] } = {},
): Promise<SpawnedBrowser> {
  const viewport = options.viewport ?? PHONE;
  const child = spawn(
    findChromium(),
    [
      ...CHROMIUM_FLAGS,
      `--user-data-dir=${userDataDir}`,
      '--remote-debugging-port=0',
      '--remote-debugging-address=127.0.0.1',
      `--window-size=${viewport.width},${viewport.height}`,
      // A crashed profile would otherwise offer to restore the last session.
      '--hide-crash-restore-bubble',
      ...(options.extraArgs ?? []),
      'about:blank',
    ],
    { detached: true, stdio: ['ignore', 'ignore', 'pipe'] },
  );
  const pid = child.pid;
  if (pid === undefined) throw new Error('Chromium did not start (no process id)');
  let exited = false;
  child.once('exit', () => {
    exited = true;
  });
  const endpoint = await devToolsEndpoint(child, 30_000);
  const browser = await chromium.connectOverCDP(endpoint);
  const context = browser.contexts()[0];
  if (!context) throw new Error('Chromium over CDP has no default context');

  const waitGone = async (timeoutMs: number) => {
    const end = Date.now() + timeoutMs;
    while (groupAlive(pid) || !exited) {
      if (Date.now() > end) throw new Error(`Chromium process group ${pid} is still alive`);
      await new Promise((r) => setTimeout(r, 50));
    }
  };
  return {
    browser,
    context,
    pid,
    async kill() {
      try {
        process.kill(-pid, 'SIGKILL');
      } catch {
        // Already gone.
      }
      await waitGone(10_000);
      await browser.close().catch(() => undefined);
    },
    async close() {
      await browser.close().catch(() => undefined);
      try {
        process.kill(-pid, 'SIGTERM');
      } catch {
        // Already gone.
      }
      await waitGone(10_000).catch(() => {
        try {
          process.kill(-pid, 'SIGKILL');
        } catch {
          // Already gone.
        }
      });
    },
  };
}
