import type { PolynomialSystem } from '../expr/node.ts';
import { compileCertifiableSystem, type CertifiableSystem } from './certifiable-system.ts';
import { createPointCertifier, type PointCertificate, type PointCertifierOptions } from './certify-point.ts';

/** A batch of points to certify, in a structured-cloneable form (the body of a worker message). */
export interface CertifyBatch {
  /** Identifies the system for caching: the same key must always come with the same system. */
  readonly key: string;
  /** Sent the first time a worker sees the key; omitted afterwards. */
  readonly system?: PolynomialSystem;
  readonly parameters: Float64Array;
  /** Points one after another, 2n numbers each (packed complex). */
  readonly points: Float64Array;
  readonly real: boolean;
  readonly options: PointCertifierOptions;
}

/** Per-point results of a batch, packed: flags (bit 0 certified, bit 1 real), radii, boxes and enclosures (4n each), reasons. */
export interface CertifiedBatch {
  readonly flags: Uint8Array;
  readonly radii: Float64Array;
  readonly boxes: Float64Array;
  readonly enclosures: Float64Array;
  readonly reasons: (string | undefined)[];
}

const compiled = new Map<string, CertifiableSystem>();

/** Certifies one batch in the current thread (a worker's body, or the in-process fallback); caches compiled systems by key. */
export function certifyBatch(batch: CertifyBatch): CertifiedBatch {
  let system = compiled.get(batch.key);
  if (system === undefined) {
    if (batch.system === undefined) throw new Error(`certify batch: system "${batch.key}" was never sent to this thread`);
    system = compileCertifiableSystem(batch.system);
    compiled.clear(); // one system at a time is enough; keeps memory bounded
    compiled.set(batch.key, system);
  }
  const n = system.size;
  system.setParameters(batch.parameters);
  const certifier = createPointCertifier(system, batch.options);
  const count = batch.points.length / (2 * n);
  const flags = new Uint8Array(count), radii = new Float64Array(count), boxes = new Float64Array(4 * n * count), enclosures = new Float64Array(4 * n * count);
  const reasons: (string | undefined)[] = [];
  for (let k = 0; k < count; k++) {
    const result = certifier.point(batch.points.subarray(2 * n * k, 2 * n * (k + 1)), batch.real);
    flags[k] = (result.certified ? 1 : 0) | (result.certifiedReal ? 2 : 0);
    radii[k] = result.radius;
    if (result.certified) { boxes.set(result.box, 4 * n * k); enclosures.set(result.enclosure, 4 * n * k); }
    reasons.push(result.reason);
  }
  return { flags, radii, boxes, enclosures, reasons };
}

/** Unpacks a batch result into per-point certificates. */
export function unpackBatch(result: CertifiedBatch, n: number): PointCertificate[] {
  return Array.from(result.flags, (f, k) => ({
    certified: (f & 1) === 1,
    certifiedReal: (f & 2) === 2,
    radius: result.radii[k]!,
    box: (f & 1) === 1 ? result.boxes.slice(4 * n * k, 4 * n * (k + 1)) : new Float64Array(0),
    enclosure: (f & 1) === 1 ? result.enclosures.slice(4 * n * k, 4 * n * (k + 1)) : new Float64Array(0),
    ...(result.reasons[k] === undefined ? {} : { reason: result.reasons[k] }),
  }));
}
