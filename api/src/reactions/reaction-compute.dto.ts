import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsNumber,
  IsOptional,
  IsString,
  Matches,
  MaxLength,
  Min,
  MinLength,
  ValidateNested,
} from 'class-validator';
import { MAX_TEMPERATURES } from '../shared/temperatures';

const RELEASE_LABEL = /^[0-9]{4}\.[1-9][0-9]*$/;
const FINITE = { allowNaN: false, allowInfinity: false };

export class EquationDto {
  @IsString({ message: 'equation must be text such as "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)"' })
  @MinLength(1, { message: 'equation is required' })
  @MaxLength(1000, { message: 'equation must be at most 1000 characters' })
  equation: string;
}

export class EvaluateReactionDto extends EquationDto {
  @IsOptional()
  @IsArray({ message: 'temperatures must be a list of temperatures in kelvin' })
  @ArrayMinSize(1, { message: 'temperatures must list at least one temperature' })
  @ArrayMaxSize(MAX_TEMPERATURES, { message: `temperatures may list at most ${MAX_TEMPERATURES} temperatures` })
  @IsNumber(FINITE, { each: true, message: 'each temperature must be a number of kelvin' })
  temperatures?: number[];

  @IsOptional()
  @IsNumber(FINITE, { message: 'tMin must be a number of kelvin' })
  tMin?: number;

  @IsOptional()
  @IsNumber(FINITE, { message: 'tMax must be a number of kelvin' })
  tMax?: number;

  @IsOptional()
  @IsNumber(FINITE, { message: 'tStep must be a number of kelvin' })
  tStep?: number;

  @IsOptional()
  @Matches(RELEASE_LABEL, { message: 'release must be a release label such as 2026.2' })
  release?: string;

  @IsOptional()
  @IsBoolean({ message: 'extrapolate must be true or false' })
  extrapolate?: boolean;
}

export class UncertainEnthalpyDto {
  @IsNumber(FINITE, { message: 'reactionEnthalpy.value must be a number of J/mol' })
  value: number;

  @IsNumber(FINITE, { message: 'reactionEnthalpy.uncertainty must be a number of J/mol' })
  @Min(0, { message: 'reactionEnthalpy.uncertainty must not be negative' })
  uncertainty: number;
}

export class DeriveFormationDto extends EquationDto {
  @ValidateNested()
  @Type(() => UncertainEnthalpyDto)
  reactionEnthalpy: UncertainEnthalpyDto;

  @IsString({ message: 'target must be the species whose ΔfH° is derived, e.g. "C2H5OH(l)"' })
  @MinLength(1, { message: 'target is required' })
  @MaxLength(200)
  target: string;

  @IsOptional()
  @Matches(RELEASE_LABEL, { message: 'release must be a release label such as 2026.2' })
  release?: string;
}

export class AdiabaticRiseDto {
  @IsNumber(FINITE, { message: 'deltaH must be the reaction enthalpy in J/mol' })
  deltaH: number;

  @IsNumber(FINITE, { message: 'amount must be the amount of reaction in mol' })
  @Min(0, { message: 'amount must not be negative' })
  amount: number;

  @IsNumber(FINITE, { message: 'mass must be the mass of the reacting mixture in kg' })
  mass: number;

  @IsNumber(FINITE, { message: 'specificHeat must be the specific heat capacity of the mixture in J/(kg·K)' })
  specificHeat: number;
}
