import { z } from 'astro/zod';

/**
 * Plane drawing primitives in world coordinates. Definitions produce them (from an instance's parameters and
 * from each real solution); the writer stores them in the record; pages draw them with d3 and never solve.
 * A conic is the zero set of a·x² + b·xy + c·y² + d·x + e·y + f; a line is the zero set of a·x + b·y + c.
 */
export const figureShapeSchema = z.discriminatedUnion('shape', [
  z.object({ shape: z.literal('circle'), cx: z.number(), cy: z.number(), r: z.number().nonnegative() }),
  z.object({ shape: z.literal('conic'), coefficients: z.tuple([z.number(), z.number(), z.number(), z.number(), z.number(), z.number()]) }),
  z.object({ shape: z.literal('line'), a: z.number(), b: z.number(), c: z.number() }),
  z.object({ shape: z.literal('point'), x: z.number(), y: z.number() }),
  z.object({ shape: z.literal('polyline'), points: z.array(z.tuple([z.number(), z.number()])).min(2), closed: z.boolean().default(false) }),
]);

/** One drawn item: its shape, the layer it belongs to ("given", "solution", "tangency", …) and an optional label. */
export const figureItemSchema = z.intersection(
  figureShapeSchema,
  z.object({ layer: z.string().min(1), label: z.string().optional(), solution: z.number().int().nonnegative().optional() }),
);

/** A whole figure: the world window to show, the items (drawn in order), and in which plane they are drawn. */
export const figureSchema = z.object({
  window: z.object({ xMin: z.number(), xMax: z.number(), yMin: z.number(), yMax: z.number() }),
  items: z.array(figureItemSchema),
  /** One sentence for the caption: the plane drawn and how space is projected to it (records before it: absent). */
  projection: z.string().min(1).optional(),
});

export type FigureShape = z.infer<typeof figureShapeSchema>;
export type FigureItem = z.infer<typeof figureItemSchema>;
export type Figure = z.infer<typeof figureSchema>;
