import { WaterTemperaturePage } from '@/features/formula/components/water-temperature-page';

export function FormulaWaterTemperatureRoute() {
  return <WaterTemperaturePage />;
}
