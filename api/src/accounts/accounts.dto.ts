import { ArrayNotEmpty, ArrayUnique, IsArray, IsEmail, IsIn, IsOptional, IsString, MaxLength, MinLength } from 'class-validator';
import { ROLES, type Role } from '../auth/principal';

export class InvitationDto {
  @IsEmail({}, { message: 'email must be an e-mail address' })
  email: string;

  @IsArray()
  @ArrayNotEmpty({ message: 'roles must name at least one role' })
  @ArrayUnique()
  @IsIn(ROLES, { each: true, message: `each role must be one of ${ROLES.join(', ')}` })
  roles: Role[];
}

export class RolesDto {
  @IsArray()
  @ArrayUnique()
  @IsIn(ROLES, { each: true, message: `each role must be one of ${ROLES.join(', ')}` })
  roles: Role[];
}

export class CreateApiKeyDto {
  @IsString()
  @MinLength(1, { message: 'name is required' })
  @MaxLength(100)
  name: string;

  @IsOptional()
  @IsIn(['read', 'write'], { message: 'scope must be read or write' })
  scope?: 'read' | 'write';
}
