/** A signed reference to a slot; null stands for the exact value 0. */
export type SlotRef = { readonly slot: number; readonly neg: boolean } | null;

/** One instruction of the straight-line program; every slot is written once (SSA). */
export type Instruction =
  | { readonly op: 'load'; readonly out: number; readonly index: number }
  | { readonly op: 'sum'; readonly out: number; readonly terms: readonly number[]; readonly negs: readonly boolean[] }
  | { readonly op: 'mul'; readonly out: number; readonly a: number; readonly b: number }
  | { readonly op: 'sqr'; readonly out: number; readonly a: number };
