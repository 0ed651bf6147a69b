import type { MonodromyGroup } from '../atlas/record.ts';
import type { PublishedGroup } from '../atlas/published-group.ts';

/** Digits grouped by thin spaces in threes: '1451520' → '1 451 520' (orders can exceed Number's exact range). */
export function groupedDigits(digits: string): string {
  return digits.replace(/\B(?=(\d{3})+(?!\d))/g, '\u2009');
}

/** The conclusion in one sentence: what the loops' permutations generate, and how it was decided. */
export function groupConclusion(g: MonodromyGroup): string {
  const loops = `${g.closedLoops} of ${g.loops} random loops closed on the ${g.degree} solutions`;
  const order = g.order === null ? '' : ` of order ${groupedDigits(g.order)}`;
  switch (g.verdict) {
    case 'symmetric':
      return `${loops}; their permutations generate the full symmetric group${order}: every rearrangement of the solutions is realised by moving the data, so no algebraic rule tells any of them apart.`;
    case 'alternating':
      return `${loops}; their permutations generate the alternating group${order} (every loop permutes the solutions evenly).`;
    case 'intransitive':
      return `${loops}; their permutations do not mix all the solutions (the group they generate is intransitive): the loops seen split the solutions into separate orbits.`;
    case 'order':
      return `${loops}; their permutations generate a ${g.primitive ? 'primitive' : 'transitive but imprimitive'} group${order}, smaller than the full symmetric group: the solutions carry structure that every loop preserves.`;
    case 'undecided':
      if (g.closedLoops === 0) return `None of the ${g.loops} random loops closed on the ${g.degree} solutions (on each, some route failed or met another), so no group is claimed.`;
      return `${loops}; the group they generate is transitive, but above 64 solutions its order is not computed and no loop gave Jordan's witness (a prime cycle), so the verdict stays open.`;
  }
}

/**
 * Whether the loops' group agrees with the published one ('match'), differs ('differs'), or cannot be compared
 * ('none'). A published order is compared with the exact order; a published full symmetric group on n letters
 * matches a 'symmetric' verdict on n solutions (a proof, by Jordan's theorem or the order) and differs from any
 * other decided verdict ('undecided' compares as 'none': more loops may still prove it).
 */
export function publishedComparison(g: MonodromyGroup | undefined, published: PublishedGroup | undefined): 'match' | 'differs' | 'none' {
  if (!g || !published) return 'none';
  if (published.symmetricOn !== undefined) {
    if (g.verdict === 'undecided') return 'none';
    return g.verdict === 'symmetric' && g.degree === published.symmetricOn ? 'match' : 'differs';
  }
  if (g.order === null) return 'none';
  return g.order === published.order ? 'match' : 'differs';
}

/** The published group's size in words: its order with grouped digits, or "n! (the full symmetric group)" when given by its degree. */
export function publishedSize(published: PublishedGroup): string {
  return published.order !== undefined ? groupedDigits(published.order) : `${published.symmetricOn}! (the full symmetric group on ${published.symmetricOn} letters)`;
}
