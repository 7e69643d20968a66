import type { Step } from '@/lib/start-in-steps';

/**
 * Native apps start in one go (index.ts steps only on the web): no library steps, and none of the web's
 * module paths in a native bundle. The web's list is modules.web.ts.
 */
export const libraryModules: readonly [string, Step][] = [];
