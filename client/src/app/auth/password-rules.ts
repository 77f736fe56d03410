import { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';

/** The API refuses shorter passwords (api/src/auth/passwords.ts). */
export const MIN_PASSWORD_LENGTH = 10;

/** On a form group: the `confirmation` control must repeat the `password` control. */
export function passwordsMatch(password: string, confirmation: string): ValidatorFn {
  return (group: AbstractControl): ValidationErrors | null => {
    const first = group.get(password)?.value as string | undefined;
    const second = group.get(confirmation)?.value as string | undefined;
    return second && first !== second ? { passwordsDiffer: true } : null;
  };
}
