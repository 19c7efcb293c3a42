import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  FOOD_IDS,
  FORMULA_AMOUNT_MAX,
  FORMULA_BLEND_FLOURS_MAX,
  FORMULA_BLEND_PARTS_MAX,
  FORMULA_DENSITY_MAX,
  FORMULA_DENSITY_MIN,
  FORMULA_INGREDIENT_KINDS,
  FORMULA_INGREDIENT_NAME_MAX_LENGTH,
  FORMULA_INGREDIENTS_MAX,
  FORMULA_NAME_MAX_LENGTH,
  FORMULA_NOTES_MAX_LENGTH,
  FORMULA_UNITS,
  HYDRATION_MAX_PCT,
  type ComputeFormulaRequest,
  type CreateFormulaRequest,
  type FormulaBlendFlour,
  type FormulaIngredient,
  type FormulaIngredientKind,
  type FormulaUnit,
  type UpdateFormulaRequest,
} from '@peakwise/shared';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsIn, ValidateNested } from 'class-validator';
import { Omittable, Trim } from '../../common/dto-helpers.js';
import { Clearable, HYDRATION, IsMeasure, IsText, TrimToNull } from '../../common/log-fields.js';
import { FormulaScalingDto } from './formula-scaling.dto.js';
import { OnlyForStarter } from './formula-validators.js';

const NAME_MESSAGE = `Enter a name of 1 to ${FORMULA_NAME_MAX_LENGTH} characters.`;
const LINE_NAME_MESSAGE = `Name it in 1 to ${FORMULA_INGREDIENT_NAME_MAX_LENGTH} characters.`;

export class FormulaIngredientDto implements FormulaIngredient {
  @ApiProperty({ enum: FORMULA_INGREDIENT_KINDS })
  @IsIn(FORMULA_INGREDIENT_KINDS, { message: `Choose one of: ${FORMULA_INGREDIENT_KINDS.join(', ')}.` })
  kind: FormulaIngredientKind;

  @ApiProperty({ example: 'Bread flour', maxLength: FORMULA_INGREDIENT_NAME_MAX_LENGTH })
  @Trim()
  @IsText(1, FORMULA_INGREDIENT_NAME_MAX_LENGTH, LINE_NAME_MESSAGE)
  name: string;

  @ApiProperty({ minimum: 0, exclusiveMinimum: true, maximum: FORMULA_AMOUNT_MAX, description: 'In `unit`' })
  @IsMeasure({
    min: 0,
    minExclusive: true,
    max: FORMULA_AMOUNT_MAX,
    message: `Enter an amount above 0 and at most ${FORMULA_AMOUNT_MAX}.`,
  })
  amount: number;

  @ApiProperty({ enum: FORMULA_UNITS, example: 'g' })
  @IsIn(FORMULA_UNITS, { message: `Choose a unit: ${FORMULA_UNITS.join(', ')}.` })
  unit: FormulaUnit;

  @ApiPropertyOptional({ type: String, enum: FOOD_IDS, nullable: true, description: 'USDA-weighed food' })
  @Clearable()
  @IsIn(FOOD_IDS, { message: 'Choose a food from the list.' })
  food?: string | null;

  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    minimum: FORMULA_DENSITY_MIN,
    maximum: FORMULA_DENSITY_MAX,
    description: 'g/mL you measured; wins over the food’s',
  })
  @Clearable()
  @IsMeasure({
    min: FORMULA_DENSITY_MIN,
    max: FORMULA_DENSITY_MAX,
    message: `Enter a density from ${FORMULA_DENSITY_MIN} to ${FORMULA_DENSITY_MAX} g/mL (a cup of flour is about 0.5).`,
  })
  densityGPerMl?: number | null;

  @ApiPropertyOptional({
    type: Number,
    nullable: true,
    minimum: 0,
    exclusiveMinimum: true,
    maximum: HYDRATION_MAX_PCT,
    description: '% (water ÷ flour × 100), starter only; 100 when left out',
  })
  @Clearable()
  @OnlyForStarter()
  @IsMeasure(HYDRATION)
  starterHydrationPct?: number | null;
}

export class FormulaBlendFlourDto implements FormulaBlendFlour {
  @ApiProperty({ example: 'Whole rye', maxLength: FORMULA_INGREDIENT_NAME_MAX_LENGTH })
  @Trim()
  @IsText(1, FORMULA_INGREDIENT_NAME_MAX_LENGTH, LINE_NAME_MESSAGE)
  name: string;

  @ApiProperty({ minimum: 0, exclusiveMinimum: true, maximum: FORMULA_BLEND_PARTS_MAX, example: 3 })
  @IsMeasure({
    min: 0,
    minExclusive: true,
    max: FORMULA_BLEND_PARTS_MAX,
    message: `Enter parts above 0 and at most ${FORMULA_BLEND_PARTS_MAX}.`,
  })
  parts: number;
}

const IngredientList = () => (target: object, key: string) => {
  ApiProperty({ type: [FormulaIngredientDto], minItems: 1, maxItems: FORMULA_INGREDIENTS_MAX })(target, key);
  // Registered in this order so a non-list is reported as such, not as "too short".
  IsArray({ message: 'Send the ingredients as a list.' })(target, key);
  ArrayMinSize(1, { message: 'Add at least one ingredient.' })(target, key);
  ArrayMaxSize(FORMULA_INGREDIENTS_MAX, { message: `Keep to ${FORMULA_INGREDIENTS_MAX} ingredients.` })(target, key);
  ValidateNested({ each: true })(target, key);
  Type(() => FormulaIngredientDto)(target, key);
};

const BlendList = () => (target: object, key: string) => {
  ApiPropertyOptional({ type: [FormulaBlendFlourDto], maxItems: FORMULA_BLEND_FLOURS_MAX })(target, key);
  Omittable()(target, key);
  IsArray({ message: 'Send the blend as a list.' })(target, key);
  ArrayMaxSize(FORMULA_BLEND_FLOURS_MAX, { message: `Keep to ${FORMULA_BLEND_FLOURS_MAX} flours.` })(target, key);
  ValidateNested({ each: true })(target, key);
  Type(() => FormulaBlendFlourDto)(target, key);
};

const ScalingField = () => (target: object, key: string) => {
  ApiPropertyOptional({ type: FormulaScalingDto, nullable: true })(target, key);
  Clearable()(target, key);
  ValidateNested()(target, key);
  Type(() => FormulaScalingDto)(target, key);
};

export class ComputeFormulaDto implements ComputeFormulaRequest {
  @IngredientList()
  ingredients: FormulaIngredientDto[];

  @BlendList()
  blend?: FormulaBlendFlourDto[];

  @ScalingField()
  scaling?: FormulaScalingDto | null;
}

export class CreateFormulaDto extends ComputeFormulaDto implements CreateFormulaRequest {
  @ApiProperty({ example: 'Country loaf, 75 %', maxLength: FORMULA_NAME_MAX_LENGTH })
  @Trim()
  @IsText(1, FORMULA_NAME_MAX_LENGTH, NAME_MESSAGE)
  name: string;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: FORMULA_NOTES_MAX_LENGTH })
  @TrimToNull()
  @Clearable()
  @IsText(1, FORMULA_NOTES_MAX_LENGTH, `Keep notes to ${FORMULA_NOTES_MAX_LENGTH} characters.`)
  notes?: string | null;
}

export class UpdateFormulaDto implements UpdateFormulaRequest {
  @ApiPropertyOptional({ example: 'Country loaf, 75 %', maxLength: FORMULA_NAME_MAX_LENGTH })
  @Omittable()
  @Trim()
  @IsText(1, FORMULA_NAME_MAX_LENGTH, NAME_MESSAGE)
  name?: string;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: FORMULA_NOTES_MAX_LENGTH })
  @TrimToNull()
  @Clearable()
  @IsText(1, FORMULA_NOTES_MAX_LENGTH, `Keep notes to ${FORMULA_NOTES_MAX_LENGTH} characters.`)
  notes?: string | null;

  @Omittable()
  @IngredientList()
  ingredients?: FormulaIngredientDto[];

  @BlendList()
  blend?: FormulaBlendFlourDto[];

  @ScalingField()
  scaling?: FormulaScalingDto | null;
}
