import { createRandom } from '../engine/index.ts';
import type { InstanceDefinition, ProblemDefinition } from './definition.ts';

/**
 * The packed complex parameter vector of an instance, in the formulation's parameter order. A 'generic'
 * instance draws each parameter as a complex number with independent standard normal parts from its seed;
 * a 'demo' instance must give every parameter a finite value. Errors name the problem, instance and field.
 */
export function parametersOf(definition: ProblemDefinition, instance: InstanceDefinition): Float64Array {
  const names = definition.formulation.parameters;
  const out = new Float64Array(2 * names.length);
  if (instance.kind === 'generic') {
    const random = createRandom(instance.seed);
    for (let j = 0; j < names.length; j++) random.gaussianComplex(out, 2 * j);
    return out;
  }
  const given = instance.parameters ?? {};
  names.forEach((name, j) => {
    const where = `problem "${definition.slug}", instance "${instance.id}", parameters.${name}`;
    const v = given[name];
    if (v === undefined) throw new Error(`${where}: missing`);
    const [re, im] = typeof v === 'number' ? [v, 0] : v;
    if (typeof re !== 'number' || typeof im !== 'number' || !Number.isFinite(re) || !Number.isFinite(im)) {
      throw new Error(`${where}: must be a finite number or [re, im], got ${JSON.stringify(v)}`);
    }
    out[2 * j] = re;
    out[2 * j + 1] = im;
  });
  for (const name of Object.keys(given)) {
    if (!names.includes(name)) throw new Error(`problem "${definition.slug}", instance "${instance.id}", parameters.${name}: not a parameter of the formulation`);
  }
  return out;
}
