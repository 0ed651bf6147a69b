const ONES = ['zero', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine', 'ten', 'eleven', 'twelve',
  'thirteen', 'fourteen', 'fifteen', 'sixteen', 'seventeen', 'eighteen', 'nineteen'];
const TENS = ['', '', 'twenty', 'thirty', 'forty', 'fifty', 'sixty', 'seventy', 'eighty', 'ninety'];
const GROUPS = ['', ' thousand', ' million', ' billion', ' trillion'];

function belowThousand(n: number): string {
  const hundreds = Math.floor(n / 100), rest = n % 100;
  const tail = rest < 20 ? ONES[rest]! : `${TENS[Math.floor(rest / 10)]}${rest % 10 ? `-${ONES[rest % 10]}` : ''}`;
  if (hundreds === 0) return tail;
  return `${ONES[hundreds]} hundred${rest ? ` ${tail}` : ''}`;
}

/**
 * A non-negative integer below 10¹⁵ in English words, without "and" ("3264" → "three thousand two hundred
 * sixty-four"), so that pages answer searches like "nine flexes". Throws on anything else.
 */
export function numberWords(n: number): string {
  if (!Number.isInteger(n) || n < 0 || n >= 1e15) throw new RangeError(`numberWords: ${n} is not an integer in [0, 10^15)`);
  if (n === 0) return ONES[0]!;
  const parts: string[] = [];
  for (let g = 0, rest = n; rest > 0; g++, rest = Math.floor(rest / 1000)) {
    const chunk = rest % 1000;
    if (chunk) parts.unshift(`${belowThousand(chunk)}${GROUPS[g]}`);
  }
  return parts.join(' ');
}
