import { ApiProperty } from '@nestjs/swagger';
import {
  FORMULA_CAUTIONS,
  FORMULA_INGREDIENT_KINDS,
  FORMULA_UNITS,
  type Formula,
  type FormulaBlendLineView,
  type FormulaCaution,
  type FormulaCautionCode,
  type FormulaComputed,
  type FormulaIngredientKind,
  type FormulaLineView,
  type FormulaListItem,
  type FormulaListResponse,
  type FormulaScaledLineView,
  type FormulaScaledView,
  type FormulaTotalLineView,
  type FormulaUnit,
} from '@peakwise/shared';
import { FormulaBlendFlourDto, FormulaIngredientDto } from './formula.dto.js';
import { FormulaScalingDto } from './formula-scaling.dto.js';

// Documents the Formula shapes (shared/src/contracts/formula.ts) in the OpenAPI reference.

const KIND = { enum: FORMULA_INGREDIENT_KINDS };

export class FormulaLineViewDoc implements FormulaLineView {
  @ApiProperty(KIND) kind: FormulaIngredientKind;
  @ApiProperty() name: string;
  @ApiProperty({ description: 'In `unit`, as typed' }) amount: number;
  @ApiProperty({ enum: FORMULA_UNITS }) unit: FormulaUnit;
  @ApiProperty({ description: 'g' }) grams: number;
  @ApiProperty({ enum: ['mass', 'usda-household-measure', 'density', 'your-density'] })
  gramsBasis: FormulaLineView['gramsBasis'];
  @ApiProperty({ type: String, nullable: true, example: '1 cup = 137 g (USDA SR 20083, bread flour)' })
  gramsNote: string | null;
  @ApiProperty({ description: 'g' }) flourG: number;
  @ApiProperty({ description: 'g' }) waterG: number;
  @ApiProperty({ description: '% of all flour' }) percentOfTotalFlour: number;
  @ApiProperty({ type: Number, nullable: true, description: '% of the flour lines' })
  percentOfFinalDoughFlour: number | null;
}

export class FormulaTotalLineViewDoc implements FormulaTotalLineView {
  @ApiProperty(KIND) kind: FormulaIngredientKind;
  @ApiProperty() name: string;
  @ApiProperty({ description: 'g' }) grams: number;
  @ApiProperty({ description: 'g inside a starter' }) prefermentedG: number;
  @ApiProperty({ description: '%' }) percentOfTotalFlour: number;
}

export class FormulaBlendLineViewDoc implements FormulaBlendLineView {
  @ApiProperty() name: string;
  @ApiProperty() parts: number;
  @ApiProperty({ description: '%' }) percent: number;
  @ApiProperty({ description: 'g' }) grams: number;
  @ApiProperty({ description: 'g, whole, adding up to the rounded flour weight' }) roundedG: number;
}

export class FormulaScaledLineViewDoc implements FormulaScaledLineView {
  @ApiProperty(KIND) kind: FormulaIngredientKind;
  @ApiProperty() name: string;
  @ApiProperty({ description: 'g' }) grams: number;
  @ApiProperty({ description: 'g, to weigh' }) roundedG: number;
}

export class FormulaScaledViewDoc implements FormulaScaledView {
  @ApiProperty({ type: FormulaScalingDto }) scaling: FormulaScalingDto;
  @ApiProperty() factor: number;
  @ApiProperty({ description: 'g' }) doughWeightG: number;
  @ApiProperty({ description: 'g' }) totalFlourG: number;
  @ApiProperty({ type: [FormulaScaledLineViewDoc] }) lines: FormulaScaledLineViewDoc[];
  @ApiProperty({ type: [FormulaBlendLineViewDoc] }) blend: FormulaBlendLineViewDoc[];
  @ApiProperty() roundingRule: string;
}

export class FormulaCautionDoc implements FormulaCaution {
  @ApiProperty({ enum: FORMULA_CAUTIONS }) code: FormulaCautionCode;
  @ApiProperty() message: string;
}

export class FormulaComputedView implements FormulaComputed {
  @ApiProperty({ type: [FormulaLineViewDoc] }) lines: FormulaLineViewDoc[];
  @ApiProperty({ type: [FormulaTotalLineViewDoc] }) totalFormula: FormulaTotalLineViewDoc[];
  @ApiProperty({ description: 'g' }) doughWeightG: number;
  @ApiProperty({ description: 'g, starter flour included' }) totalFlourG: number;
  @ApiProperty({ description: 'g, starter, milk and butter water included' }) totalWaterG: number;
  @ApiProperty({ description: '%' }) totalHydrationPercent: number;
  @ApiProperty({ description: '%' }) prefermentedFlourPercent: number;
  @ApiProperty({ description: '% of all flour' }) saltPercent: number;
  @ApiProperty({ description: 'g' }) finalDoughFlourG: number;
  @ApiProperty({ type: Number, nullable: true, description: '%' }) finalDoughHydrationPercent: number | null;
  @ApiProperty({ type: Number, nullable: true, description: '%' }) finalDoughSaltPercent: number | null;
  @ApiProperty({ type: [FormulaBlendLineViewDoc] }) blend: FormulaBlendLineViewDoc[];
  @ApiProperty({ type: FormulaScaledViewDoc, nullable: true }) scaled: FormulaScaledViewDoc | null;
  @ApiProperty({ type: [String] }) assumptions: string[];
  @ApiProperty({ type: [String] }) warnings: string[];
  @ApiProperty({ type: [FormulaCautionDoc] }) cautions: FormulaCautionDoc[];
}

export class FormulaView implements Formula {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: 'Country loaf, 75 %' }) name: string;
  @ApiProperty({ type: String, nullable: true }) notes: string | null;
  @ApiProperty({ type: [FormulaIngredientDto] }) ingredients: FormulaIngredientDto[];
  @ApiProperty({ type: [FormulaBlendFlourDto] }) blend: FormulaBlendFlourDto[];
  @ApiProperty({ type: FormulaScalingDto, nullable: true }) scaling: FormulaScalingDto | null;
  @ApiProperty({ type: FormulaComputedView }) computed: FormulaComputedView;
  @ApiProperty({ format: 'date-time' }) createdAt: string;
  @ApiProperty({ format: 'date-time' }) updatedAt: string;
}

export class FormulaListItemView implements FormulaListItem {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty() ingredientCount: number;
  @ApiProperty({ format: 'date-time' }) updatedAt: string;
}

export class FormulaListView implements FormulaListResponse {
  @ApiProperty({ type: [FormulaListItemView] }) items: FormulaListItemView[];
  @ApiProperty() total: number;
  @ApiProperty() limit: number;
  @ApiProperty() offset: number;
}
