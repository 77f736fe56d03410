import { HttpErrorResponse } from '@angular/common/http';
import { ErrorHandler } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatSnackBar } from '@angular/material/snack-bar';

import { AppErrorHandler } from './app-error-handler';

describe('AppErrorHandler', () => {
  let handler: ErrorHandler;
  let snackBar: jasmine.SpyObj<MatSnackBar>;

  beforeEach(() => {
    snackBar = jasmine.createSpyObj<MatSnackBar>('MatSnackBar', ['open']);
    TestBed.configureTestingModule({
      providers: [
        { provide: ErrorHandler, useClass: AppErrorHandler },
        { provide: MatSnackBar, useValue: snackBar },
      ],
    });
    handler = TestBed.inject(ErrorHandler);
    spyOn(console, 'error');
  });

  it('logs an uncaught error and tells the reader', () => {
    const error = new TypeError('x is undefined');

    handler.handleError(error);

    expect(console.error).toHaveBeenCalledWith(error);
    expect(snackBar.open).toHaveBeenCalledOnceWith(
      jasmine.stringMatching(/^Something went wrong on this page/),
      'Dismiss',
      jasmine.objectContaining({ panelClass: 'kx-snackbar-error' }),
    );
  });

  it('only logs HTTP errors, which the interceptor has already shown', () => {
    const error = new HttpErrorResponse({ status: 500 });

    handler.handleError(error);

    expect(console.error).toHaveBeenCalledWith(error);
    expect(snackBar.open).not.toHaveBeenCalled();
  });
});
