/**
 * Browser-test setup: serve the built app (dist/, built by the test command before this
 * runs) on a free localhost port and hand its address to the tests as `inject('appUrl')`
 * (also KERFLINE_APP_URL for helpers that run outside a test).
 */
import type { TestProject } from 'vitest/node';
import { serveDir } from './static-server.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    appUrl: string;
  }
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const served = await serveDir('dist');
  project.provide('appUrl', served.url);
  process.env.KERFLINE_APP_URL = served.url;
  return () => served.close();
}
