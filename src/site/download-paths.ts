import { problemPath } from '../atlas/permalink.ts';

/** Site paths of a problem's downloads, all under its permanent page path. */
export const downloadPaths = {
  /** Every instance's solutions, keyed by coordinate name, with their certificate boxes (compact JSON). */
  solutionsJson: (slug: string) => `${problemPath(slug)}solutions.json`,
  /** One row per solution (CSV). */
  solutionsCsv: (slug: string) => `${problemPath(slug)}solutions.csv`,
  /** The polynomial system of every instance, parameters substituted (plain text). */
  system: (slug: string) => `${problemPath(slug)}system.txt`,
  /** One instance's polynomials alone, one per line. */
  instanceSystem: (slug: string, instance: string) => `${problemPath(slug)}system-${instance}.txt`,
  /** One instance's figure as a standalone SVG file. */
  figureSvg: (slug: string, instance: string) => `${problemPath(slug)}figure-${instance}.svg`,
};
