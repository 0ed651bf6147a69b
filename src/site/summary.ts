import type { SolveRecord } from '../atlas/record.ts';
import { familyPath, problemPath } from '../atlas/permalink.ts';
import { bezoutFromDegrees, instancesInPageOrder } from './ladder.ts';
import { recordRealness, type Realness } from './realness.ts';

/** One problem as listed on the home and family pages (counts from its first instance in page order). */
export interface ProblemSummary {
  readonly slug: string;
  readonly title: string;
  readonly family: string;
  readonly href: string;
  readonly familyHref: string;
  readonly bezout: number;
  readonly multihomogeneous: number | null;
  readonly trueCount: number | null;
  readonly found: number;
  readonly certified: number;
  readonly real: number;
  readonly realness: Realness;
  readonly tags: readonly string[];
}

/** Summarises a record for listings; the Bézout bound is the product of the formulation's degrees. */
export function problemSummary(record: SolveRecord): ProblemSummary {
  const first = instancesInPageOrder(record)[0];
  if (!first) throw new Error(`record "${record.slug}" has no instance`);
  return {
    slug: record.slug,
    title: record.title,
    family: record.family,
    href: problemPath(record.slug),
    familyHref: familyPath(record.family),
    bezout: bezoutFromDegrees(record.formulation.equationDegrees),
    multihomogeneous: first.counts.multihomogeneousBound,
    trueCount: record.trueCount,
    found: first.counts.found,
    certified: first.counts.certifiedDistinct,
    real: first.counts.real,
    realness: recordRealness(record),
    tags: [...record.tags],
  };
}

/** Problems grouped by family: families alphabetically, problems by title within each. */
export function byFamily(summaries: readonly ProblemSummary[]): { family: string; href: string; problems: ProblemSummary[] }[] {
  const groups = new Map<string, ProblemSummary[]>();
  for (const s of summaries) groups.set(s.family, [...(groups.get(s.family) ?? []), s]);
  return [...groups.keys()].sort((a, b) => a.localeCompare(b)).map((family) => ({
    family,
    href: groups.get(family)![0]!.familyHref,
    problems: groups.get(family)!.sort((a, b) => a.title.localeCompare(b.title)),
  }));
}
