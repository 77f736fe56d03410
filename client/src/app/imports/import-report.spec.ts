import { HttpErrorResponse } from '@angular/common/http';

import { problemsCsv, problemsOfRefusal, reportFileName } from './import-report';

describe('import report', () => {
  const problems = [
    { line: 3, field: 'unit', message: 'unit must be one of kJ/mol, J/mol, kcal/mol, cal/mol for dfH (got "kJ")' },
    { line: 7, message: 'a row repeats line 4' },
  ];

  it('writes every problem with its line number as CSV', () => {
    expect(problemsCsv(problems)).toBe(
      'line,column,problem\r\n3,unit,"unit must be one of kJ/mol, J/mol, kcal/mol, cal/mol for dfH (got ""kJ"")"\r\n7,,a row repeats line 4\r\n',
    );
  });

  it('reads the problems from a refused import', () => {
    const refusal = new HttpErrorResponse({ status: 422, error: { error: 'unprocessable', message: '2 problems', details: { jobId: 'j', problems } } });
    expect(problemsOfRefusal(refusal)).toEqual(problems);
    expect(problemsOfRefusal(new HttpErrorResponse({ status: 415, error: {} }))).toBeNull();
  });

  it('names the report after the file', () => {
    expect(reportFileName('solvents-2027.csv')).toBe('solvents-2027-problems.csv');
    expect(reportFileName('batch.xml')).toBe('batch-problems.csv');
  });
});
