/** Where the build and test outputs live, relative to the repository. */
import { fileURLToPath } from 'node:url';

export const repoRoot = fileURLToPath(new URL('../../../', import.meta.url));
export const distDir = fileURLToPath(new URL('../../../dist/', import.meta.url));
export const screenshotDir = fileURLToPath(new URL('../../output/screenshots/', import.meta.url));
