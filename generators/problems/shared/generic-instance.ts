import type { InstanceDefinition } from '../../../src/atlas/definition.ts';

/** The 'generic' instance of a problem: every parameter a random complex number from the recorded seed. */
export function genericInstance(label: string, seed: number, what = 'All parameters'): InstanceDefinition {
  return { id: 'generic', kind: 'generic', label, description: `${what} drawn as random complex numbers (independent standard normal real and imaginary parts) from the recorded seed.`, seed };
}
