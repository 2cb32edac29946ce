import type { QuantityKind } from '../../lib/calculators/units';
import type { PidControllerInput } from '../../lib/schemas/controller';
import type { ProcessModelInput } from '../../lib/schemas/process-model';

/** One editable parameter of a model or a controller, as the controls list it. */
export interface FieldSpec {
  key: string;
  label: string;
  kind: QuantityKind;
  unit: string;
  /** Smallest value a typed entry may have. */
  min?: number;
  /** Whether 0 is a meaningful setting (dead time, derivative off), which a log slider cannot reach. */
  zeroAllowed?: boolean;
}

/** The parameters of each low-order model (a full transfer function has only its dead time). */
export function modelFields(model: ProcessModelInput): FieldSpec[] {
  const k: FieldSpec = { key: 'k', label: model.type === 'ipdt' ? 'Slope gain K' : 'Process gain K', kind: 'plain', unit: model.type === 'ipdt' ? '1/s' : '' };
  const theta: FieldSpec = { key: 'theta', label: 'Dead time θ', kind: 'time', unit: 's', min: 0, zeroAllowed: true };
  switch (model.type) {
    case 'fopdt':
      return [k, { key: 'tau', label: 'Time constant τ', kind: 'time', unit: 's', min: 1e-6 }, theta];
    case 'sopdt':
      return [k, { key: 'tau1', label: 'Time constant τ1', kind: 'time', unit: 's', min: 1e-6 }, { key: 'tau2', label: 'Time constant τ2', kind: 'time', unit: 's', min: 1e-6 }, theta];
    case 'ipdt':
      return [k, theta];
    case 'tf':
      return [{ key: 'delay', label: 'Dead time θ', kind: 'time', unit: 's', min: 0, zeroAllowed: true }];
  }
}

/** The settings of each PID form. */
export function controllerFields(controller: PidControllerInput): FieldSpec[] {
  if (controller.form === 'parallel') {
    return [
      { key: 'kp', label: 'Kp', kind: 'gain', unit: '' },
      { key: 'ki', label: 'Ki', kind: 'plain', unit: '1/s', min: 0, zeroAllowed: true },
      { key: 'kd', label: 'Kd', kind: 'time', unit: 's', min: 0, zeroAllowed: true },
      { key: 'tf', label: 'Filter Tf', kind: 'time', unit: 's', min: 0, zeroAllowed: true },
    ];
  }
  return [
    { key: 'kc', label: 'Gain Kc', kind: 'gain', unit: '' },
    { key: 'ti', label: 'Integral Ti', kind: 'integral', unit: 's', min: 0, zeroAllowed: true },
    { key: 'td', label: 'Derivative Td', kind: 'time', unit: 's', min: 0, zeroAllowed: true },
  ];
}

/** A slider range for a parameter from its starting value: ¼× to 4× on a log scale, or 0 to a span. */
export function sliderRange(spec: FieldSpec, start: number, scale: number): { min: number; max: number; log: boolean } {
  if (spec.zeroAllowed) {
    const top = start > 0 ? start * 4 : scale;
    return { min: 0, max: Number(top.toPrecision(2)) || 1, log: false };
  }
  if (start < 0) return { min: start * 4, max: start / 4, log: false };
  const base = start > 0 ? start : 1;
  return { min: base / 4, max: base * 4, log: true };
}

/** A time scale of the model in s, to size sliders of settings that start at 0. */
export function modelScale(model: ProcessModelInput): number {
  if (model.type === 'fopdt') return model.tau + model.theta;
  if (model.type === 'sopdt') return model.tau1 + model.tau2 + model.theta;
  if (model.type === 'ipdt') return Math.max(model.theta * 10, 10);
  return Math.max(1, (model.delay ?? 0) * 5);
}
