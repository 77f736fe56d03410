import { HttpErrorResponse } from '@angular/common/http';

/** Body of every error the Kelvindex API answers with. */
export interface ApiErrorBody {
  readonly error: string;
  readonly message: string;
  readonly details?: unknown;
}

const MAX_DETAILS_SHOWN = 3;

export function isApiErrorBody(body: unknown): body is ApiErrorBody {
  return (
    typeof body === 'object' &&
    body !== null &&
    typeof (body as Partial<ApiErrorBody>).error === 'string' &&
    typeof (body as Partial<ApiErrorBody>).message === 'string'
  );
}

/**
 * A sentence for the reader describing a failed request: the API's own message when the body is
 * an API error (with up to three detail messages, e.g. per-field validation errors), otherwise
 * what went wrong on the way.
 */
export function describeHttpError(response: HttpErrorResponse): string {
  if (isApiErrorBody(response.error)) {
    const details = detailMessages(response.error.details);
    return details.length === 0
      ? response.error.message
      : `${response.error.message}: ${details.slice(0, MAX_DETAILS_SHOWN).join('; ')}` +
          (details.length > MAX_DETAILS_SHOWN ? ` (and ${details.length - MAX_DETAILS_SHOWN} more)` : '');
  }
  if (response.status === 0) {
    return 'Kelvindex cannot reach its server. Check your network connection and try again.';
  }
  const statusText = response.statusText && response.statusText !== 'OK' ? ` ${response.statusText}` : '';
  return `The server answered ${response.status}${statusText} for ${describeUrl(response.url)}.`;
}

function detailMessages(details: unknown): string[] {
  if (!Array.isArray(details)) {
    return [];
  }
  return details.flatMap((detail: unknown) => {
    if (typeof detail === 'string') {
      return [detail];
    }
    if (typeof detail === 'object' && detail !== null && typeof (detail as { message?: unknown }).message === 'string') {
      return [(detail as { message: string }).message];
    }
    return [];
  });
}

function describeUrl(url: string | null): string {
  if (!url) {
    return 'the request';
  }
  try {
    return new URL(url, 'http://localhost').pathname;
  } catch {
    return url;
  }
}
