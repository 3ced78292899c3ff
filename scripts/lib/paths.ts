// Project-relative locations used by the operational scripts.
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const projectRoot = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
/** Git-ignored folder for every instance's data (databases, mail). */
export const dataRoot = join(projectRoot, '.data');
