import { z } from 'astro/zod';
import { complexSchema } from './record.ts';

/**
 * Files the writer puts beside a record (content/systems/<slug>.json, content/certificates/<slug>.json) so that a
 * reader can check the record: the polynomial system of every instance with its exact parameters substituted, and
 * the Krawczyk boxes that certify its solutions. Pages read them; they never solve.
 */

/** The expanded system of every instance, in the formulation's unknowns, in the atlas's plain notation (polynomialText). */
export const systemsFileSchema = z.object({
  slug: z.string().min(1),
  unknowns: z.array(z.string().min(1)).min(1),
  instances: z.array(z.object({
    id: z.string().min(1),
    /** The parameters exactly as solved (binary64; the record rounds them to 15 significant digits). */
    parameters: z.record(z.string(), complexSchema),
    /** One polynomial per equation; the system is "each = 0". */
    equations: z.array(z.string().min(1)).min(1),
  })),
});

/** A box in the unknowns: [reLo, reHi, imLo, imHi] per unknown. */
export const boxSchema = z.array(z.tuple([z.number(), z.number(), z.number(), z.number()])).min(1);

/** Per instance, per solution (record order): the box on which Krawczyk's test passed, or null when not certified. */
export const certificatesFileSchema = z.object({
  slug: z.string().min(1),
  unknowns: z.array(z.string().min(1)).min(1),
  instances: z.array(z.object({ id: z.string().min(1), boxes: z.array(boxSchema.nullable()) })),
});

export type SystemsFile = z.infer<typeof systemsFileSchema>;
export type CertificatesFile = z.infer<typeof certificatesFileSchema>;
export type Box = z.infer<typeof boxSchema>;
