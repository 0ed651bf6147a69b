import { existsSync, readFileSync } from 'node:fs';
import { canonicalJson } from '../../src/atlas/canonical-json.ts';
import { describeChange, describeFirst, utcDate } from '../../src/atlas/history.ts';
import { parseRecord } from '../../src/atlas/read-record.ts';
import { solveRecordSchema, type SolveRecord } from '../../src/atlas/record.ts';
import { formatIssues } from '../../src/atlas/validation-issue.ts';
import { AtlasError } from '../pipeline/atlas-error.ts';
import { displayPath } from '../pipeline/load-definition.ts';
import { writeFileAtomic, type BeforeRename } from './atomic-write.ts';
import { certificatesPath, pagePath, recordPath, systemsPath } from './content-paths.ts';
import type { ProblemSidecars } from '../pipeline/sidecars-of.ts';
import { emptyReasons, regressionReasons } from './regression-guard.ts';
import { renderPage } from './render-page.ts';

/** Options of one publication: replace a worse record anyway, the history date (UTC YYYY-MM-DD), a test hook. */
export interface PublishOptions {
  readonly force?: boolean;
  readonly date?: string;
  readonly beforeRename?: BeforeRename;
}

/** What publishing did: created, replaced (with the history entry's change), left unchanged, or refused (reasons). */
export type PublishOutcome =
  | { readonly status: 'created' | 'unchanged'; readonly record: SolveRecord }
  | { readonly status: 'replaced'; readonly record: SolveRecord; readonly change: string }
  | { readonly status: 'refused'; readonly reasons: readonly string[] };

/**
 * Writes a freshly solved record (its history is ignored) and its page under the content root. The published
 * record's history is carried over; identical bytes are not rewritten (the page and the sidecar files, when given, are
 * rewritten only if they differ);
 * a worse record (or one with an instance that found nothing though its count is positive) is refused unless
 * `force`; the first publication and every replacement append a dated history entry. Record first, then page, each
 * atomically. A published record that cannot be read is an AtlasError('content') unless `force`.
 */
export function publish(root: string, fresh: SolveRecord, options: PublishOptions = {}, sidecars?: ProblemSidecars): PublishOutcome {
  const file = recordPath(root, fresh.slug);
  const previousText = existsSync(file) ? readFileSync(file, 'utf8') : null;
  const previous = previousText === null ? null : parseRecord(previousText);
  if (previous && !previous.ok && !options.force) {
    throw new AtlasError('content', `${formatIssues(displayPath(file), previous.issues)}\nthe published record is unreadable; repair it or pass --force to replace it`);
  }
  const published = previous?.ok ? previous.value : null;
  let record: SolveRecord = { ...fresh, history: published ? [...published.history] : [] };
  let text = canonicalJson(record);
  if (published && text === previousText) {
    writePage(root, record, options);
    if (sidecars) writeSidecars(root, sidecars, options);
    return { status: 'unchanged', record };
  }
  const reasons = [...emptyReasons(record), ...(published ? regressionReasons(published, record) : [])];
  if (reasons.length > 0 && !options.force) return { status: 'refused', reasons };
  const change = published
    ? describeChange(published, record) + (reasons.length > 0 ? ` (forced over: ${reasons.join('; ')})` : '')
    : describeFirst(record) + (reasons.length > 0 ? ` (forced over: ${reasons.join('; ')})` : '');
  const entry = { date: options.date ?? utcDate(), engineVersion: record.engineVersion, change };
  record = { ...record, history: [...record.history, entry] };
  text = canonicalJson(record);
  const check = solveRecordSchema.safeParse(record);
  if (!check.success) throw new AtlasError('solve', `internal error: the new record of "${record.slug}" fails its schema at ${check.error.issues[0]!.path.join('.')}: ${check.error.issues[0]!.message}; nothing written`);
  writeFileAtomic(file, text, options.beforeRename);
  writePage(root, record, options);
  if (sidecars) writeSidecars(root, sidecars, options);
  return published ? { status: 'replaced', record, change } : { status: 'created', record };
}

/** Writes the files beside a record (expanded systems, certificate boxes), each only when its bytes differ. */
export function writeSidecars(root: string, sidecars: ProblemSidecars, options: PublishOptions = {}): void {
  const files: [string, unknown][] = [
    [systemsPath(root, sidecars.systems.slug), sidecars.systems],
    [certificatesPath(root, sidecars.certificates.slug), sidecars.certificates],
  ];
  for (const [file, data] of files) {
    const text = canonicalJson(data, { compactNumberArrays: true });
    if (!existsSync(file) || readFileSync(file, 'utf8') !== text) writeFileAtomic(file, text, options.beforeRename);
  }
}

/** Writes the record's page when its bytes differ from what is on disk. */
export function writePage(root: string, record: SolveRecord, options: PublishOptions = {}): boolean {
  const file = pagePath(root, record.slug);
  const text = renderPage(record);
  if (existsSync(file) && readFileSync(file, 'utf8') === text) return false;
  writeFileAtomic(file, text, options.beforeRename);
  return true;
}
