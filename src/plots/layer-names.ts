/** Display names of figure layers; unknown layers get their own name with a capital first letter. */
const NAMES: Readonly<Record<string, string>> = {
  given: 'Given',
  solution: 'Solutions',
  tangency: 'Tangency points',
  construction: 'Construction',
  intersection: 'Intersections',
};

/** The button/legend label of a layer. */
export function layerLabel(layer: string): string {
  return NAMES[layer] ?? layer.charAt(0).toUpperCase() + layer.slice(1).replace(/[-_]/g, ' ');
}

/** Style class of a layer: one of the known layer names, or "other". */
export function layerClass(layer: string): string {
  return layer in NAMES ? `layer-${layer}` : 'layer-other';
}
