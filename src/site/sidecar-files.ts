import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { certificatesFileSchema, systemsFileSchema, type CertificatesFile, type SystemsFile } from '../atlas/sidecars.ts';
import { contentDir } from './content-dir.ts';
import { explorationSchema, type Exploration } from '../atlas/exploration.ts';

function read<T>(folder: string, slug: string, parse: (data: unknown) => T): T | null {
  const file = join(contentDir(), folder, `${slug}.json`);
  if (!existsSync(file)) return null;
  try {
    return parse(JSON.parse(readFileSync(file, 'utf8')));
  } catch (error) {
    throw new Error(`content: ${folder}/${slug}.json: ${(error as Error).message}`, { cause: error });
  }
}

/** A problem's expanded systems (content/systems/<slug>.json), validated; null when the writer has not made one yet. */
export function readSystems(slug: string): SystemsFile | null {
  return read('systems', slug, (d) => systemsFileSchema.parse(d));
}

/** A problem's certificate boxes (content/certificates/<slug>.json), validated; null when absent. */
export function readCertificates(slug: string): CertificatesFile | null {
  return read('certificates', slug, (d) => certificatesFileSchema.parse(d));
}

/** A problem's real-solution exploration (content/explorations/<slug>.json), validated; null when none was run. */
export function readExploration(slug: string): Exploration | null {
  return read('explorations', slug, (d) => explorationSchema.parse(d));
}
