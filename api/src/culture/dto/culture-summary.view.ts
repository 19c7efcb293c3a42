import { ApiProperty } from '@nestjs/swagger';
import {
  CULTURE_STATES,
  type CultureKineticsSummary,
  type CultureState,
  type CultureSummary,
  type PeakForecast,
  type RisePoint,
  type RunningFeeding,
} from '@peakwise/shared';
import { FeedingView } from '../../feeding/dto/feeding.view.js';
import { CultureView } from './culture.view.js';

// Documents CultureSummary (shared/src/contracts/culture-summary.ts) in the OpenAPI reference.

export class RisePointView implements RisePoint {
  @ApiProperty({ description: 'hours since feeding' }) hours: number;
  @ApiProperty({ description: '× the initial height' }) multiple: number;
}

export class RunningFeedingView implements RunningFeeding {
  @ApiProperty({ type: FeedingView }) feeding: FeedingView;
  @ApiProperty({ enum: ['rising', 'peaked', 'insufficient-data'] }) riseStatus: RunningFeeding['riseStatus'];
  @ApiProperty({ type: [RisePointView], description: 'Empty without an initial height' }) readings: RisePointView[];
  @ApiProperty({ type: [RisePointView], nullable: true }) fittedCurve: RisePointView[] | null;
  @ApiProperty({ type: Number, nullable: true, description: '× the initial height' }) riseMultiple: number | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) peakAt: string | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) readyFrom: string | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) readyUntil: string | null;
}

export class PeakForecastView implements PeakForecast {
  @ApiProperty({ format: 'date-time' }) peakAt: string;
  @ApiProperty({ format: 'date-time' }) low: string;
  @ApiProperty({ format: 'date-time' }) high: string;
  @ApiProperty({ example: 0.8 }) level: number;
  @ApiProperty({ description: 'h' }) hoursToPeak: number;
  @ApiProperty({ enum: ['readings', 'culture', 'default'] }) basis: PeakForecast['basis'];
}

export class HoursAtTemperatureView {
  @ApiProperty({ description: '°C' }) temperatureC: number;
  @ApiProperty({ description: 'h' }) hours: number;
}

export class KineticsObservationView {
  @ApiProperty({ format: 'uuid' }) feedingId: string;
  @ApiProperty({ format: 'date-time' }) fedAt: string;
  @ApiProperty({ description: '°C' }) temperatureC: number;
  @ApiProperty({ description: 'h' }) hoursToPeak: number;
  @ApiProperty({ description: '(starter + flour + water) / starter' }) dilution: number;
}

export class CultureKineticsView implements CultureKineticsSummary {
  @ApiProperty({ example: 'ratkowsky1983' }) model: string;
  @ApiProperty({ description: 'h, 1:1:1 at the reference temperature' }) hoursToPeakAtReference: number;
  @ApiProperty({ example: 24, description: '°C' }) referenceTemperatureC: number;
  @ApiProperty({ type: [HoursAtTemperatureView] }) hoursToPeakAt: HoursAtTemperatureView[];
  @ApiProperty({ type: Number, nullable: true }) q10: number | null;
  @ApiProperty({ type: Number, nullable: true, description: '°C' }) tMin: number | null;
  @ApiProperty({ type: Number, nullable: true, description: '°C' }) tOpt: number | null;
  @ApiProperty({ type: Number, nullable: true, description: '°C' }) tMax: number | null;
  @ApiProperty({ enum: ['steady', 'faster', 'slower'] }) trend: CultureKineticsSummary['trend'];
  @ApiProperty() feedingsUsed: number;
  @ApiProperty({ enum: ['culture', 'default'] }) basis: CultureKineticsSummary['basis'];
  @ApiProperty({ type: [KineticsObservationView] }) observations: KineticsObservationView[];
}

export class CultureSummaryView implements CultureSummary {
  @ApiProperty({ type: CultureView }) culture: CultureView;
  @ApiProperty({ enum: CULTURE_STATES }) state: CultureState;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) lastFedAt: string | null;
  @ApiProperty({ type: RunningFeedingView, nullable: true }) running: RunningFeedingView | null;
  @ApiProperty({ type: PeakForecastView, nullable: true }) forecast: PeakForecastView | null;
  @ApiProperty({ type: CultureKineticsView }) kinetics: CultureKineticsView;
  @ApiProperty({ type: String, nullable: true, description: 'Shown with a discolouration observation' })
  caution: string | null;
}
