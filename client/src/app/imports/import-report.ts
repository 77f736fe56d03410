import { HttpErrorResponse } from '@angular/common/http';

import { csvText } from '../shared/csv/csv-file';
import { ImportProblem } from './imports-api';

/** The problems as a CSV file (line, column, message) for the steward to work through. */
export function problemsCsv(problems: readonly ImportProblem[]): string {
  return csvText(
    ['line', 'column', 'problem'],
    problems.map((problem) => [problem.line, problem.field ?? '', problem.message]),
  );
}

/** The problems a refused real import (422) lists, when its body carries them. */
export function problemsOfRefusal(error: unknown): ImportProblem[] | null {
  if (!(error instanceof HttpErrorResponse) || error.status !== 422) {
    return null;
  }
  const details = (error.error as { details?: { problems?: ImportProblem[] } } | null)?.details;
  return Array.isArray(details?.problems) ? details.problems : null;
}

/** The name of the report file for an import file: `values.csv` → `values-problems.csv`. */
export function reportFileName(fileName: string): string {
  return `${fileName.replace(/\.[^.]+$/, '') || 'import'}-problems.csv`;
}
