import type { InstanceResult, SolveRecord } from '../atlas/record.ts';
import { formatCount } from './format.ts';
import { bezoutFromDegrees } from './ladder.ts';
import { numberWords } from './number-words.ts';

/**
 * The page's answer in one sentence, numbers also in words for search ("True count 9 (nine) over the complex
 * numbers; naive Bézout bound 9. Toy railway: 9 found, 9 certified distinct, 3 real.").
 */
export function answerSentence(record: SolveRecord, first: InstanceResult): string {
  const n = record.trueCount;
  const count = n === null ? 'True count unknown' : `True count ${formatCount(n)} (${numberWords(n)}) over the complex numbers`;
  const c = first.counts;
  return `${count}; naive Bézout bound ${formatCount(bezoutFromDegrees(record.formulation.equationDegrees))}. ` +
    `${first.label}: ${formatCount(c.found)} found, ${formatCount(c.certifiedDistinct)} certified distinct, ${formatCount(c.real)} real.`;
}
