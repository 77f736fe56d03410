import { AbstractControl, FormControl, FormGroup, ValidationErrors, Validators } from '@angular/forms';

import { Role } from '../core/auth';
import { ROLES } from './admin-api';

export type RoleChoices = FormGroup<Record<Role, FormControl<boolean>>>;

export type InvitationForm = FormGroup<{ email: FormControl<string>; roles: RoleChoices }>;

/** On the role checkboxes: at least one role. */
export function atLeastOneRole(group: AbstractControl): ValidationErrors | null {
  return Object.values(group.value as Record<Role, boolean>).some(Boolean) ? null : { roles: true };
}

/** The roles ticked, in their usual order. */
export function chosenRoles(choices: Record<Role, boolean>): Role[] {
  return ROLES.filter((role) => choices[role]);
}

/** An invitation: the address and the roles the new user starts with (reader by default). */
export function invitationForm(): InvitationForm {
  const roles = Object.fromEntries(ROLES.map((role) => [role, new FormControl(role === 'reader', { nonNullable: true })])) as Record<Role, FormControl<boolean>>;
  return new FormGroup({
    email: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.email, Validators.maxLength(320)] }),
    roles: new FormGroup(roles, { validators: atLeastOneRole }),
  });
}
