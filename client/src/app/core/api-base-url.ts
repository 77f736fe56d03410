import { InjectionToken } from '@angular/core';

/** Base path of the Kelvindex REST API, served from the same origin as the client. */
export const API_BASE_URL = new InjectionToken<string>('API_BASE_URL', {
  providedIn: 'root',
  factory: () => '/api/v1',
});
