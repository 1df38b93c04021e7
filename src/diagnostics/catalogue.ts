/**
 * Every diagnostic code chartwright can emit, with its severity. Codes are a public contract
 * (tests outside the project and users' CI scripts match on them): add codes, never rename.
 */
export const CATALOGUE = {
  // brief: the document itself
  'brief.not-found': 'error',
  'brief.parse-error': 'error',
  'brief.not-an-object': 'error',
  'brief.unknown-option': 'error',
  'brief.wrong-type': 'error',
  'brief.bad-value': 'error',
  'brief.missing-option': 'error',
  'brief.out-of-range': 'error',
  'brief.data-and-rows': 'error',
  'brief.unknown-column': 'error',
  'brief.style-not-found': 'error',
  'brief.bad-style': 'error',
  'brief.low-contrast': 'warning',
  'brief.indistinct-colours': 'warning',
  'brief.option-not-used': 'error',
  'brief.bad-alias': 'error',
  'brief.bad-format': 'error',
  'brief.too-many-problems': 'error',
  // table: reading and typing the data
  'table.not-found': 'error',
  'table.unreadable': 'error',
  'table.unknown-format': 'error',
  'table.empty': 'error',
  'table.header-only': 'error',
  'table.duplicate-column': 'error',
  'table.empty-column-name': 'error',
  'table.ragged-row': 'error',
  'table.bad-json': 'error',
  'table.not-an-array': 'error',
  'table.row-not-an-object': 'error',
  'table.nested-value': 'error',
  'table.mixed-column': 'warning',
  'table.type-mismatch': 'error',
  'table.too-large': 'error',
  'table.bad-encoding': 'error',
  'table.ambiguous-decimal': 'error',
  // fields: roles and measurement types
  'fields.order-incomplete': 'error',
  'fields.order-duplicate': 'error',
  // choice: the rules
  'choice.intent-not-supported': 'error',
  'choice.form-not-supported': 'error',
  'choice.no-key': 'error',
  'choice.too-many-keys': 'error',
  'choice.no-value': 'error',
  'choice.too-many-values': 'error',
  'choice.value-not-quantitative': 'error',
  'choice.baseline-fit-refused': 'error',
  'choice.order-not-applicable': 'error',
  'choice.lenient-fallback': 'warning',
  'choice.unit-missing': 'warning',
  'choice.no-rule': 'error',
  'choice.line-on-categorical': 'error',
  'choice.radial-not-cyclic': 'error',
  'choice.too-many-colours': 'error',
  'choice.matrix-needs-two-keys': 'error',
  // derive: the numbers drawn
  'derive.aggregated': 'info',
  'derive.missing-values': 'warning',
  'derive.others-folded': 'warning',
  'derive.no-rows': 'error',
  'derive.too-many-ordered-bars': 'error',
  'derive.uneven-dates': 'warning',
  'derive.not-finite': 'error',
  'derive.missing-cells': 'warning',
  'derive.too-many-items': 'error',
  // layout: text and geometry
  'layout.labels-thinned': 'info',
  'layout.label-truncated': 'warning',
  'layout.missing-glyphs': 'warning',
  'layout.frame-too-small': 'error',
  'layout.text-off-canvas': 'warning',
  'layout.text-overlap': 'warning',
  'layout.labels-unplaced': 'warning',
  // output
  'output.write-failed': 'error',
  'output.raster-failed': 'error',
  // output: where files may go and how large a PNG may be (checked before anything is written)
  'output.bad-name': 'error',
  'output.bad-extension': 'error',
  'output.outside': 'error',
  'output.collision': 'error',
  'output.overwrites-input': 'error',
  'output.png-too-large': 'error',
  'output.png-too-small': 'error',
  // cli: the command line's briefs and input size limits
  'cli.folder-unreadable': 'error',
  'cli.no-briefs': 'error',
  'cli.brief-too-large': 'error',
  'cli.style-too-large': 'error',
  // a defect in chartwright itself, never the user's fault
  'render.internal': 'error',
} as const;

/** A stable diagnostic code, namespaced by the stage that raises it. */
export type DiagnosticCode = keyof typeof CATALOGUE;

/** How bad a diagnostic is. `--strict` raises warnings to errors; errors are never lowered. */
export type Severity = 'error' | 'warning' | 'info';

/** The catalogued severity of a code. */
export function severityOf(code: DiagnosticCode): Severity {
  return CATALOGUE[code];
}
