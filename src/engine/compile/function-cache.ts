/**
 * Functions built from generated source text (`new Function(source)()`: the source returns the function), cached
 * by text so a system of the same structure reuses warm, already optimised code. Keeps the `size` most recently
 * added; an evicted source is simply rebuilt when it comes back.
 */
export function createFunctionCache<F>(size: number): (source: string) => F {
  const functions = new Map<string, F>();
  return (source) => {
    let f = functions.get(source);
    if (f === undefined) {
      f = new Function(source)() as F;
      if (functions.size >= size) functions.delete(functions.keys().next().value!);
      functions.set(source, f);
    }
    return f;
  };
}
