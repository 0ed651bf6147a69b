import { figureSchema, type Figure } from '../../src/atlas/figure.ts';
import { spaceFigureSchema, type SpaceFigure, type SpaceItem } from '../../src/atlas/space-figure.ts';
import { isSpaceDrawing, type ProblemDefinition } from '../../src/atlas/definition.ts';
import { AtlasError } from './atlas-error.ts';

/**
 * The figure of a real instance: the drawing's window (a plane drawing) or static sight (a space drawing), its
 * configuration, then each listed real solution's items tagged with its index in the record. Null without a drawing
 * or when some parameter is not real. Throws an AtlasError naming the drawing function that failed or produced an
 * item outside the figure schema.
 */
export function figureOf(
  definition: ProblemDefinition,
  parameters: Readonly<Record<string, readonly [number, number]>>,
  realSolutions: readonly { index: number; values: readonly number[] }[],
  where: string,
): Figure | SpaceFigure | null {
  const drawing = definition.drawing;
  if (!drawing || Object.values(parameters).some(([, im]) => im !== 0)) return null;
  const real = Object.fromEntries(Object.entries(parameters).map(([k, [re]]) => [k, re]));
  const call = <T>(field: string, run: () => T): T => {
    try {
      return run();
    } catch (error) {
      throw new AtlasError('input', `${where}: drawing.${field}: threw ${error instanceof Error ? error.message : String(error)}`);
    }
  };
  const projection = drawing.projection ? { projection: drawing.projection } : {};
  let parsed;
  if (isSpaceDrawing(drawing)) {
    const items: SpaceItem[] = call('configuration', () => drawing.configuration(real));
    for (const s of realSolutions) {
      for (const item of call('solution', () => drawing.solution(s.values, real))) items.push({ ...item, solution: s.index });
    }
    parsed = spaceFigureSchema.safeParse({ kind: 'space', sight: call('sight', () => drawing.sight(real, items)), items, ...projection });
  } else {
    const items = call('configuration', () => drawing.configuration(real));
    for (const s of realSolutions) {
      for (const item of call('solution', () => drawing.solution(s.values, real))) items.push({ ...item, solution: s.index });
    }
    parsed = figureSchema.safeParse({ window: call('window', () => drawing.window(real, items)), items, ...projection });
  }
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    throw new AtlasError('input', `${where}: drawing: produced an invalid figure at ${issue.path.join('.')}: ${issue.message}`);
  }
  return parsed.data;
}
