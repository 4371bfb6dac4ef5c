/** Types of static-server.mjs (a plain module, so Node scripts can use it without a build). */
import type { AppFile } from './app-files.ts';

export interface StaticServer {
  readonly port: number;
  close(): Promise<void>;
}
export function serveStatic(
  resolveFile: (encodedPathname: string) => AppFile | null,
  options?: { port?: number; headers?: Record<string, string>; maxTries?: number },
): Promise<StaticServer>;
