import type { PidControllerInput } from '../../lib/schemas/controller';
import type { ProcessModelInput } from '../../lib/schemas/process-model';
import ParamControl from './ParamControl';
import { controllerFields, modelFields, modelScale, sliderRange } from './model-fields';

export interface LoopControlsProps {
  id: string;
  model: ProcessModelInput;
  controller: PidControllerInput;
  /** The recipe's own numbers: sliders span around them. */
  initialModel: ProcessModelInput;
  initialController: PidControllerInput;
  onModel(key: string, value: number): void;
  onController(key: string, value: number): void;
}

type Values = Record<string, number | undefined>;

/** Sliders and typed fields for the process model and the controller settings. */
export default function LoopControls({ id, model, controller, initialModel, initialController, onModel, onController }: LoopControlsProps) {
  const scale = modelScale(initialModel);
  const values = { model: model as unknown as Values, controller: controller as unknown as Values };
  const start = { model: initialModel as unknown as Values, controller: initialController as unknown as Values };
  return (
    <>
      <fieldset className="calc-group">
        <legend>Process</legend>
        {modelFields(model).map((f) => (
          <ParamControl
            key={f.key}
            label={f.label}
            kind={f.kind}
            unit={f.unit}
            min={f.min}
            value={values.model[f.key] ?? 0}
            range={sliderRange(f, start.model[f.key] ?? 0, scale)}
            onChange={(v) => onModel(f.key, v)}
            testId={`${id}-${f.key}`}
          />
        ))}
      </fieldset>
      <fieldset className="calc-group">
        <legend>Controller ({controller.form})</legend>
        {controllerFields(controller).map((f) => (
          <ParamControl
            key={f.key}
            label={f.label}
            kind={f.kind}
            unit={f.unit}
            min={f.min}
            value={values.controller[f.key] ?? 0}
            range={sliderRange(f, start.controller[f.key] ?? 0, scale)}
            onChange={(v) => onController(f.key, v)}
            testId={`${id}-${f.key}`}
          />
        ))}
      </fieldset>
    </>
  );
}
