// Public API of CSV handling.
export {
  writeCsv,
  neutraliseText,
  unneutraliseText,
  BOM,
  FORMULA_TRIGGERS,
  type CsvCell,
  type CsvWriteOptions,
} from './write';
export { parseCsv, guessDelimiter, type CsvParseResult, type CsvParseError } from './parse';
export { parsePrice, parseQuantity, type PriceParse, type ParsedPrice } from './parse-price';
export { countRefs } from './refs';
export {
  IMPORT_FIELDS,
  IMPORT_FIELD_LABELS,
  guessMapping,
  overrideMapping,
  emptyMapping,
  normaliseHeader,
} from './import-mapping';
export type { ImportField, ColumnMapping } from './import-mapping';
export { previewImport } from './import-preview';
export type { ImportKind, ImportOptions, ImportPreview, PreviewRow, RowError, ImportValues } from './import-preview';
export {
  planImport,
  rowsToProjectData,
  type ImportPlan,
  type ImportedRow,
  type PlanOptions,
  type IdKind,
} from './import-plan';
export { costReportToCsv, partsCsvHeaders, type PartsCsvOptions } from './export-parts';
export { orderSheetsToCsv, orderCsvHeaders } from './export-orders';
