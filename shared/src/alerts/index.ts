export { alertSlotKey } from './slot-key.js';
export type { WantedAlert } from './types.js';
export {
  cultureAlerts,
  CULTURE_ALERT_KINDS,
  readyWindow,
  localTime,
  FEEDING_ROUTINE_HOURS,
  PAST_PEAK_STALE_HOURS,
  FEEDING_DUE_STALE_HOURS,
  READY_FALLBACK_STALE_HOURS,
  type CultureAlertInput,
} from './culture-rules.js';
export { planAlerts, PLAN_ALERT_KINDS, PLAN_STEP_STALE_MINUTES, type PlanAlertInput } from './plan-rules.js';
export { deliveryFor, isClockTime, type DeliveryDecision, type DeliveryInput } from './delivery-rules.js';
export { channelsFor, defaultAlertPreferences, mergeAlertPreferences } from './preferences.js';
