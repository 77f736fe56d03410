import { chosenRoles, invitationForm } from './invitation-rules';

describe('invitation rules', () => {
  it('starts with the reader role and needs an e-mail address', () => {
    const form = invitationForm();
    expect(chosenRoles(form.controls.roles.getRawValue())).toEqual(['reader']);
    expect(form.controls.email.hasError('required')).toBeTrue();
    form.controls.email.setValue('not an address');
    expect(form.controls.email.hasError('email')).toBeTrue();
    form.controls.email.setValue('new.steward@kelvindex.test');
    expect(form.valid).toBeTrue();
  });

  it('needs at least one role', () => {
    const form = invitationForm();
    form.controls.email.setValue('someone@kelvindex.test');
    form.controls.roles.controls.reader.setValue(false);
    expect(form.controls.roles.hasError('roles')).toBeTrue();
    form.controls.roles.controls.steward.setValue(true);
    expect(form.valid).toBeTrue();
    expect(chosenRoles(form.controls.roles.getRawValue())).toEqual(['steward']);
  });
});
