import type { ComplexInput, ProblemDefinition } from '../../../src/atlas/definition.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { polynomial } from '../shared/form.ts';
import { genericInstance } from '../shared/generic-instance.ts';
import type { SpaceItem } from '../../../src/atlas/space-figure.ts';
import { clearestSight } from '../../../src/plots/clearest-sight.ts';
import { boxEdges } from '../shared/space-box.ts';

/** What distinguishes one "three surfaces of degree d meet" page from another. */
export interface SurfaceTripleSpec {
  readonly slug: string;
  readonly degree: number;
  readonly noun: string;
  readonly genericSeed: number;
  /** Coefficients of the three demo surfaces in monomialExponents(3, d) order. */
  readonly demo: { id: string; label: string; description: string; seed: number; surfaces: readonly [readonly number[], readonly number[], readonly number[]] };
  /** Half-width of the cube drawn around the demo's real points. */
  readonly frame: number;
}

/** Three general surfaces of degree d in 3-space meet in d³ points (Bézout); the formulation is the three equations in (x, y, z). */
export function surfaceTripleProblem(spec: SurfaceTripleSpec): ProblemDefinition {
  const d = spec.degree;
  const exponents = monomialExponents(3, d);
  const names = ['p', 'q', 'r'].map((prefix) => coefficientNames(prefix, 3, d));
  const parameters: Record<string, ComplexInput> = Object.fromEntries(names.flatMap((group, k) => group.map((n, m) => [n, spec.demo.surfaces[k]![m]!] as const)));
  const frame = () => boxEdges(spec.frame, 'construction', `the cube from −${spec.frame} to ${spec.frame}`);
  return {
    slug: spec.slug,
    title: `Points common to three ${spec.noun} surfaces`,
    family: 'intersections',
    tags: ['Bézout', 'surfaces', 'intersection', `${spec.noun} surfaces`, '3-space', 'Bézout bound exact'],
    statement: `Three general ${spec.noun} surfaces $p = 0$, $q = 0$, $r = 0$ in 3-space, each the zero set of a polynomial of degree $${d}$ in $(x, y, z)$ with $${exponents.length}$ coefficients, meet in $${d} \\cdot ${d} \\cdot ${d} = ${d ** 3}$ points of complex projective 3-space (Bézout's theorem). For general coefficients all of them are finite.`,
    formulation: {
      unknowns: ['x', 'y', 'z'],
      parameters: names.flat(),
      equations: (u, c, ops) => names.map((group) => polynomial(ops, group.map((n) => c[n]!), exponents, [u.x!, u.y!, u.z!])),
      description: `The affine coordinates $(x, y, z)$ of a common point; three equations of degree $${d}$, so the Bézout bound is $${d ** 3}$.`,
    },
    trueCount: {
      value: d ** 3,
      source: {
        kind: 'published',
        authors: ['W. Fulton'],
        year: 1984,
        title: 'Intersection Theory',
        venue: 'Springer, Ergebnisse der Mathematik und ihrer Grenzgebiete 3. Folge, Band 2 (1984)',
        bib: { type: 'book', publisher: 'Springer', address: 'Berlin' },
        note: `Bézout's theorem in projective space: n general hypersurfaces of degrees d₁, …, dₙ in Pⁿ meet in d₁⋯dₙ points, ${d ** 3} here (the book's chapter 8, from memory; the chapter and the proposition were not re-read). The series and volume are as reference lists give them for the second edition (Springer 1998, doi 10.1007/978-1-4612-1700-8); that the first edition carries the same is from memory.`,
      },
    },
    excessNote: `None: three general ${spec.noun} surfaces meet transversally in exactly $${d ** 3}$ points, none on the plane at infinity (the top-degree parts of three general forms have no common zero there), so every path of the total-degree homotopy ends at a distinct solution. Excess appears only in special position, for instance when the three surfaces share a curve.`,
    instances: [
      genericInstance(`Three random complex ${spec.noun} surfaces`, spec.genericSeed, `All ${3 * exponents.length} coefficients`),
      { id: spec.demo.id, kind: 'demo', label: spec.demo.label, description: spec.demo.description, seed: spec.demo.seed, parameters },
    ],
    drawing: {
      kind: 'space',
      projection: `The cube from −${spec.frame} to ${spec.frame} on each axis is drawn for scale (edges dashed), and a thin line drops from each real point to the cube's floor.`,
      sight: (_, items) => clearestSight(items.filter((i) => i.shape === 'dot')),
      configuration: frame,
      solution: ([x, y, z]): SpaceItem[] => [
        { shape: 'dot', at: [x!, y!, z!], layer: 'solution' },
        { shape: 'stick', from: [x!, y!, -spec.frame], to: [x!, y!, z!], layer: 'depth' },
      ],
    },
  };
}
