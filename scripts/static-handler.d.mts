import type { IncomingMessage, ServerResponse } from 'node:http';

export const CONTENT_SECURITY_POLICY: string;
export function createStaticHandler(
  root: string,
): (req: IncomingMessage, res: ServerResponse) => void;
