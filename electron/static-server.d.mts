/** Types of static-server.mjs (a plain module, so Node scripts can use it without a build). */
export interface StaticServer {
  readonly port: number;
  close(): Promise<void>;
}
export function serveStatic(root: string, options?: { port?: number; headers?: Record<string, string>; maxTries?: number }): Promise<StaticServer>;
