import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  FORMULA_DOUGH_MAX_G,
  FORMULA_LOSS_MAX_PCT,
  FORMULA_PIECE_MAX_G,
  FORMULA_PIECES_MAX,
  FORMULA_SCALE_BY,
  FORMULA_SCALE_FACTOR_MAX,
  type FormulaScaleBy,
  type FormulaScaling,
} from '@peakwise/shared';
import { IsIn } from 'class-validator';
import { IsMeasure } from '../../common/log-fields.js';
import { ForScaleBy, IsWholeNumber } from './formula-validators.js';

export class FormulaScalingDto implements FormulaScaling {
  @ApiProperty({ enum: FORMULA_SCALE_BY })
  @IsIn(FORMULA_SCALE_BY, { message: 'Scale by factor, dough-weight or pieces.' })
  by: FormulaScaleBy;

  @ApiPropertyOptional({ minimum: 0, exclusiveMinimum: true, maximum: FORMULA_SCALE_FACTOR_MAX, example: 2 })
  @ForScaleBy('factor')
  @IsMeasure({
    min: 0,
    minExclusive: true,
    max: FORMULA_SCALE_FACTOR_MAX,
    message: `Enter a factor above 0 and at most ${FORMULA_SCALE_FACTOR_MAX}.`,
  })
  factor?: number;

  @ApiPropertyOptional({ minimum: 0, exclusiveMinimum: true, maximum: FORMULA_DOUGH_MAX_G, description: 'g' })
  @ForScaleBy('dough-weight')
  @IsMeasure({
    min: 0,
    minExclusive: true,
    max: FORMULA_DOUGH_MAX_G,
    message: `Enter a dough weight above 0 g and at most ${FORMULA_DOUGH_MAX_G} g.`,
  })
  doughG?: number;

  @ApiPropertyOptional({ minimum: 1, maximum: FORMULA_PIECES_MAX, example: 12 })
  @ForScaleBy('pieces')
  @IsWholeNumber('Enter a whole number of pieces.')
  @IsMeasure({ min: 1, max: FORMULA_PIECES_MAX, message: `Enter 1 to ${FORMULA_PIECES_MAX} pieces.` })
  pieces?: number;

  @ApiPropertyOptional({ minimum: 0, exclusiveMinimum: true, maximum: FORMULA_PIECE_MAX_G, description: 'g' })
  @ForScaleBy('pieces')
  @IsMeasure({
    min: 0,
    minExclusive: true,
    max: FORMULA_PIECE_MAX_G,
    message: `Enter a piece weight above 0 g and at most ${FORMULA_PIECE_MAX_G} g.`,
  })
  pieceG?: number;

  @ApiPropertyOptional({ minimum: 0, maximum: FORMULA_LOSS_MAX_PCT, default: 0, description: '% of the mix' })
  @ForScaleBy('pieces', false)
  @IsMeasure({
    min: 0,
    max: FORMULA_LOSS_MAX_PCT - 0.001,
    message: `Enter a loss from 0 % to under ${FORMULA_LOSS_MAX_PCT} %.`,
  })
  lossPercent?: number;
}
