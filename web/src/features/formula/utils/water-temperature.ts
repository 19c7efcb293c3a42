import {
  calibrateFriction,
  waterTemperatureForDdt,
  type DdtResult,
  type FrictionResult,
  type TemperatureUnit,
} from '@peakwise/shared';
import { parseNumber } from '@/lib/format/units';

/*
 * Friction factors by mixing method, in °F as the sources give them (test-fixtures/reference/
 * SOURCES.md §6a): by hand ≈ 5 °F (J. Hamelman's figure as quoted on a Fresh Loaf thread); stand
 * mixer 20–30 °F and spiral mixer 25–30 °F are common practice — we take the middle. A friction
 * factor is a temperature difference: °C = °F ÷ 1.8, no offset.
 */
export const MIXING_METHODS = [
  { id: 'hand', label: 'By hand', frictionF: 5 },
  { id: 'stand', label: 'Stand mixer', frictionF: 25 },
  { id: 'spiral', label: 'Spiral mixer', frictionF: 27.5 },
] as const;
export type MixingMethod = (typeof MIXING_METHODS)[number]['id'] | 'own';

export function presetFriction(method: MixingMethod, unit: TemperatureUnit): number | null {
  const preset = MIXING_METHODS.find((m) => m.id === method);
  if (!preset) return null;
  return unit === 'F' ? preset.frictionF : Math.round((preset.frictionF / 1.8) * 10) / 10;
}

export interface WaterFormValues {
  desired: string;
  room: string;
  flour: string;
  withPreferment: boolean;
  preferment: string;
  method: MixingMethod;
  friction: string;
  tap: string;
  waterG: string;
}

export interface CalibrationValues {
  room: string;
  flour: string;
  preferment: string;
  water: string;
  dough: string;
}

/** The water temperature for the form as typed (in the baker's unit), or null until it reads. */
export function waterFor(values: WaterFormValues, unit: TemperatureUnit): DdtResult | null {
  const desired = parseNumber(values.desired);
  const room = parseNumber(values.room);
  const flour = parseNumber(values.flour);
  const friction = parseNumber(values.friction);
  const preferment = values.withPreferment ? parseNumber(values.preferment) : null;
  if (desired === null || room === null || flour === null || friction === null) return null;
  if (values.withPreferment && preferment === null) return null;
  const tap = parseNumber(values.tap);
  const waterG = parseNumber(values.waterG);
  return waterTemperatureForDdt({
    unit,
    desired,
    room,
    flour,
    friction,
    ...(preferment !== null ? { preferment } : {}),
    ...(tap !== null && waterG !== null && waterG > 0 ? { tap, waterG } : {}),
  });
}

/** The friction factor a past bake shows (its measured dough temperature), or null until it reads. */
export function frictionFrom(
  values: CalibrationValues,
  withPreferment: boolean,
  unit: TemperatureUnit,
): FrictionResult | null {
  const [room, flour, water, dough] = [values.room, values.flour, values.water, values.dough].map(parseNumber);
  const preferment = withPreferment ? parseNumber(values.preferment) : null;
  if (room == null || flour == null || water == null || dough == null) return null;
  if (withPreferment && preferment === null) return null;
  return calibrateFriction({
    unit,
    room,
    flour,
    water,
    finalDough: dough,
    ...(preferment !== null ? { preferment } : {}),
  });
}

/** Defaults in the baker's unit: a 24 °C (76 °F) dough in a 21 °C (70 °F) kitchen, mixed by hand. */
export function waterDefaults(unit: TemperatureUnit, waterG: string): WaterFormValues {
  const f = unit === 'F';
  return {
    desired: f ? '76' : '24',
    room: f ? '70' : '21',
    flour: f ? '70' : '21',
    withPreferment: true,
    preferment: f ? '75' : '24',
    method: 'hand',
    friction: String(presetFriction('hand', unit)),
    tap: '',
    waterG,
  };
}
