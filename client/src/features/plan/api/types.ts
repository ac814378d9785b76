/** The plan API's shapes, from the shared schemas the server validates and answers with. */
import type { KitEvaluation } from '@gramwatt/shared';

export type {
  ChargeSessionJson,
  CheckResult,
  ChosenKit,
  DayStripCell,
  KitEvaluation,
  KitSelection,
  PlanGramPrice,
  PlanKit,
  PlanKitLine,
  PlanRecord,
  PlanResult,
  PlanSummary,
  PlanSwap,
  PlanVerdict,
} from '@gramwatt/shared';

export type DesignSkyId = KitEvaluation['bindingSkyId'];
export type LedgerDay = KitEvaluation['ledgers'][number]['days'][number];
export type PlanCaution = KitEvaluation['cautions'][number];
export type SunPath = KitEvaluation['sunPaths'][number];
