/** The calculation engine's public surface (pure TypeScript; safe for islands and servers). */
export * from './types';
export { trim, degree, evaluate, evaluateComplex, multiply, add, scale, product, fromRoots } from './polynomial';
export { roots, sortRoots } from './roots';
export { createTransferFunction, tf, isProper, relativeDegree, dcGain, MAX_ORDER, type TransferFunctionInput } from './transfer-function';
export { fromProcessModel } from './process-model';
export { series, parallel, feedback, chain } from './connect';
export { pidToTransferFunction } from './pid';
export { toIdeal, toParallel, toSeries } from './pid-forms';
export * from './pid-units';
export { toStateSpace, discretizeStates, cascade, type StateSpace } from './state-space';
export { expm } from './matrix';
export { timeGrid, gridStep } from './time-grid';
export { stepResponse, impulseResponse, rampResponse, simulateInput, type TimeResponse } from './simulate';
export { closedLoopStep, closedLoopImpulse, closedLoopResponse, closedLoopTransferFunction, type Loop, type LoopInput, type LoopDrive, type LoopSignal, type LoopResponse } from './closed-loop';
export { stepInfo, type StepInfoOptions } from './step-info';
export { errorIntegrals, type ErrorIntegrals } from './error-integrals';
export { factor, magnitudeAt, phaseAt, valueAt, frequencyResponse, bode, nyquist, autoGrid, timeScales, type FactoredModel, type FrequencyResponse } from './frequency';
export { margins, reduceDeg } from './margins';
export { rootInfo, closedLoopStable, openPathStable, nyquistUnstableCount, characteristicPolynomial, type RootInfo } from './stability';
export { analyze, type AnalyzeRequest, type AnalyzeResponse } from './analyze';
export { checkAnalyses, type AnalysesRequest } from './analyze-request';
// Tuning rules as data and zod-free tuning (for islands). The request-validating entries are
// separate so that the islands' engine stays free of zod and mathjs: `./tuning` (tune,
// compareRules via `./tuning/compare`), `./discretize`, `./discrete-pid`, `./identify`, `./parse`.
export {
  tuningRules,
  ruleById,
  ruleCase,
  applicableRules,
  rangeCheck,
  designController,
  type TuningRule,
  type RuleCase,
  type RuleRange,
} from './tuning/rules';
export type { TuneResult, TunedController, TuningModel, RuleId, ControllerKind, TuneOptions } from './tuning/schema';
export { simulateLimitedLoop, type LimitedLoopRequest, type LimitedLoopResponse, type AntiWindup } from './actuator-limits';
