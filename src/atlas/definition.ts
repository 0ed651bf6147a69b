import type { ExprNode, exprBuilders as ExprOps, ParameterProblem, PolynomialSystem } from '../engine/index.ts';
import type { CountSource } from './source.ts';
import type { PublishedGroup } from './published-group.ts';
import type { RealMaximum } from './exploration.ts';
import type { FigureItem } from './figure.ts';
import type { Sight, SpaceItem } from './space-figure.ts';
import type { LadderMembership } from './ladder-membership.ts';

/** A complex value in a definition: a real number, or [re, im]. */
export type ComplexInput = number | readonly [number, number];

/**
 * One instance of a problem: concrete parameter values. A 'generic' instance draws random complex parameters
 * from its recorded seed (values omitted); a 'demo' instance is a configuration of our own with real data.
 */
export interface InstanceDefinition {
  readonly id: string;
  readonly kind: 'generic' | 'demo';
  readonly label: string;
  /** The scenario in plain words (our own invented setting, no real people or brands). */
  readonly description: string;
  readonly seed: number;
  /** Parameter values by name; required for 'demo', ignored for 'generic'. */
  readonly parameters?: Readonly<Record<string, ComplexInput>>;
}

/**
 * How to draw an instance: the given configuration, and one real solution (values in the record's coordinates,
 * real parts only). Both return plane items in world coordinates; `window` is the world rectangle to show,
 * given the parameters and, when the caller has them, every item drawn (configuration and all real solutions).
 */
export interface DrawingDefinition {
  readonly window: (parameters: Readonly<Record<string, number>>, items?: readonly FigureItem[]) => { xMin: number; xMax: number; yMin: number; yMax: number };
  readonly configuration: (parameters: Readonly<Record<string, number>>) => FigureItem[];
  readonly solution: (values: readonly number[], parameters: Readonly<Record<string, number>>) => FigureItem[];
  /** One sentence for the caption: the plane drawn and how space is projected to it ("Drawn in the (x, y)-plane."). */
  readonly projection?: string;
}

/**
 * How to draw an instance in 3-space (`kind: 'space'`): items of 3-space (src/atlas/space-figure.ts) for the given
 * configuration and for one real solution; `sight` picks the static view shown first (given every item drawn), and
 * `projection` says in one sentence what is drawn. The page adds the view's own sentence and lets the reader turn it.
 */
export interface SpaceDrawingDefinition {
  readonly kind: 'space';
  readonly sight: (parameters: Readonly<Record<string, number>>, items: readonly SpaceItem[]) => Sight;
  readonly configuration: (parameters: Readonly<Record<string, number>>) => SpaceItem[];
  readonly solution: (values: readonly number[], parameters: Readonly<Record<string, number>>) => SpaceItem[];
  readonly projection?: string;
}

/**
 * The formulation: named unknowns and parameters, and a function that builds the equations from their nodes
 * with the expression builders it is handed (`ops`: add, sub, mul, neg, pow, dot, det, constant), so that a
 * definition file outside the repository needs no import from it.
 * Optional variable groups (lists of unknown names) give a multihomogeneous structure.
 * `coordinates` optionally maps a solution to the values stored and shown (default: the unknowns themselves),
 * for formulations with auxiliary unknowns or charts; realness is judged on these values.
 */
export interface FormulationDefinition {
  readonly unknowns: readonly string[];
  readonly parameters: readonly string[];
  readonly equations: (
    unknowns: Readonly<Record<string, ExprNode>>,
    parameters: Readonly<Record<string, ExprNode>>,
    ops: typeof ExprOps,
  ) => ExprNode[];
  readonly groups?: readonly (readonly string[])[];
  /** One or two sentences on the chosen coordinates and why (shown on the page). */
  readonly description: string;
  readonly coordinates?: {
    readonly names: readonly string[];
    /** Maps a solution (packed complex, unknown order) to packed complex values in `names` order. */
    readonly map: (x: Float64Array) => Float64Array;
  };
}

/**
 * How the generator solves a problem. 'total-degree' and 'multihomogeneous' track every path of the start
 * system (the naive count at work); richer strategies (parameter homotopy from a stored generic solution set,
 * monodromy) extend this union.
 */
export type SolverChoice =
  | { readonly kind: 'total-degree' }
  | { readonly kind: 'multihomogeneous' }
  | {
      /** Parameter homotopy from a stored generic solution set (src/engine/parameter/solve-by-parameter-homotopy.ts). */
      readonly kind: 'parameter-homotopy';
      /** The published generic count the stored set holds (checked when the set is loaded or rebuilt). */
      readonly expected: number;
      /** Loads (or rebuilds by monodromy and caches) the stored set and returns the engine's ParameterProblem for the shown system. */
      readonly prepare: (shown: PolynomialSystem) => Promise<ParameterProblem>;
    };

/** A problem of the atlas: everything a generator needs to solve it and a page needs to explain it. */
export interface ProblemDefinition {
  /** Permanent: never renamed once published. Lowercase words joined by hyphens. */
  readonly slug: string;
  readonly title: string;
  readonly family: string;
  readonly tags: readonly string[];
  /** The problem in words, Markdown with $…$ TeX. */
  readonly statement: string;
  readonly formulation: FormulationDefinition;
  readonly trueCount: { readonly value: number | null; readonly source: CountSource };
  /** Where the naive count's excess goes, in our own words (Markdown with $…$ TeX). */
  readonly excessNote: string;
  /** A caution shown prominently (for example on kinematics pages), or omitted. */
  readonly caution?: string;
  /** The published monodromy (Galois) group of the solutions, shown beside the one random loops generate, or omitted. */
  readonly publishedGroup?: PublishedGroup;
  /** The published largest number of real solutions (or a published instance reaching it), shown beside the explorer's best. */
  readonly realMaximum?: RealMaximum;
  readonly instances: readonly InstanceDefinition[];
  /** Defaults to total degree. */
  readonly solver?: SolverChoice;
  /**
   * Data files the solver reads at run time (absolute paths; stored solution sets, say): their bytes enter the
   * definition hash, so changing one makes `refresh` re-solve this problem. A listed file that is missing hashes as missing.
   */
  readonly reads?: readonly string[];
  readonly drawing?: DrawingDefinition | SpaceDrawingDefinition;
  /** The ladders this problem is a rung of, for links between the rungs. */
  readonly ladders?: readonly LadderMembership[];
}

/** Whether a definition's drawing draws in 3-space. */
export function isSpaceDrawing(drawing: DrawingDefinition | SpaceDrawingDefinition): drawing is SpaceDrawingDefinition {
  return 'kind' in drawing && drawing.kind === 'space';
}

/** Identity helper that gives a definition module its type checking: `export default defineProblem({ … })`. */
export function defineProblem(definition: ProblemDefinition): ProblemDefinition {
  return definition;
}
