import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';
import { MIN_PASSWORD_LENGTH } from './passwords';

const PASSWORD_RULE = `the password must be at least ${MIN_PASSWORD_LENGTH} characters`;

export class SignInDto {
  @IsEmail({}, { message: 'email must be an e-mail address' })
  email: string;

  @IsString()
  @MinLength(1, { message: 'password is required' })
  @MaxLength(200)
  password: string;
}

export class ResetRequestDto {
  @IsEmail({}, { message: 'email must be an e-mail address' })
  email: string;
}

export class ResetConfirmDto {
  @IsString()
  @MinLength(20, { message: 'token is missing or too short' })
  token: string;

  @IsString()
  @MinLength(MIN_PASSWORD_LENGTH, { message: PASSWORD_RULE })
  @MaxLength(200)
  password: string;
}

export class AcceptInvitationDto extends ResetConfirmDto {
  @IsString()
  @MinLength(1, { message: 'name is required' })
  @MaxLength(120)
  name: string;
}

export class ChangePasswordDto {
  @IsString()
  @MinLength(1, { message: 'currentPassword is required' })
  currentPassword: string;

  @IsString()
  @MinLength(MIN_PASSWORD_LENGTH, { message: PASSWORD_RULE })
  @MaxLength(200)
  newPassword: string;
}

export class TokenDto {
  @IsString()
  @MinLength(20, { message: 'token is missing or too short' })
  token: string;
}
