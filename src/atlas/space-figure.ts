import { z } from 'astro/zod';

/** A point of 3-space as [x, y, z] in world coordinates. */
export const spacePointSchema = z.tuple([z.number(), z.number(), z.number()]);

/**
 * Drawing primitives of 3-space in world coordinates (z is up): a dot at a point, a straight piece between two
 * points, and a chain of points (closed back to its first point when `closed`). Definitions produce them; the writer
 * stores them in the record; pages project them (src/plots/space-view.ts) and never solve.
 */
export const spaceShapeSchema = z.discriminatedUnion('shape', [
  z.object({ shape: z.literal('dot'), at: spacePointSchema }),
  z.object({ shape: z.literal('stick'), from: spacePointSchema, to: spacePointSchema }),
  z.object({ shape: z.literal('chain'), points: z.array(spacePointSchema).min(2), closed: z.boolean().default(false) }),
]);

/** One drawn item of a space figure: its shape, its layer ("given", "solution", …), an optional label and solution index. */
export const spaceItemSchema = z.intersection(
  spaceShapeSchema,
  z.object({ layer: z.string().min(1), label: z.string().optional(), solution: z.number().int().nonnegative().optional() }),
);

/** A direction of sight in degrees: `turn` about the vertical z-axis, then `tilt` to look down on the scene (−90…90). */
export const sightSchema = z.object({ turn: z.number(), tilt: z.number().min(-90).max(90) });

/** A figure in 3-space: the static view shown first, the items, and what is drawn (one sentence for the caption). */
export const spaceFigureSchema = z.object({
  kind: z.literal('space'),
  sight: sightSchema,
  items: z.array(spaceItemSchema),
  projection: z.string().min(1).optional(),
});

/** Whether a record's figure is a figure in 3-space (plane figures have no `kind`). */
export function isSpaceFigure<T extends object>(figure: T | SpaceFigure): figure is SpaceFigure {
  return 'kind' in figure && figure.kind === 'space';
}

export type SpacePoint = z.infer<typeof spacePointSchema>;
export type SpaceItem = z.infer<typeof spaceItemSchema>;
export type Sight = z.infer<typeof sightSchema>;
export type SpaceFigure = z.infer<typeof spaceFigureSchema>;
