import { relative } from 'node:path';
import type { Diagnostic } from '../diagnostics/diagnostic.js';
import type { BriefReport } from './batch.js';

/** The JSON run report of a batch (`render --report FILE`): one entry per brief, and totals. */
export interface RunReport {
  chartwright: string;
  summary: { briefs: number; ok: number; failed: number; errors: number; warnings: number };
  briefs: { brief: string; ok: boolean; outputs: string[]; diagnostics: Diagnostic[]; timings?: BriefReport['timings'] }[];
}

/** Builds the run report; paths are relative to the working folder, so reports are portable. */
export function runReport(reports: BriefReport[], version: string, cwd: string): RunReport {
  const rel = (p: string) => relative(cwd, p) || p;
  const count = (severity: Diagnostic['severity']) => reports.reduce((n, r) => n + r.diagnostics.filter((d) => d.severity === severity).length, 0);
  return {
    chartwright: version,
    summary: { briefs: reports.length, ok: reports.filter((r) => r.ok).length, failed: reports.filter((r) => !r.ok).length, errors: count('error'), warnings: count('warning') },
    briefs: reports.map((r) => ({
      brief: rel(r.brief), ok: r.ok, outputs: r.written.map(rel),
      diagnostics: r.diagnostics.map((d) => (d.file ? { ...d, file: rel(d.file) } : d)),
      ...(r.timings ? { timings: r.timings } : {}),
    })),
  };
}
