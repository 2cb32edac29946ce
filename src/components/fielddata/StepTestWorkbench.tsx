import { useEffect, useState } from 'react';
import '../calculators/calculators.css';
import EvidenceStep from './EvidenceStep';
import FileStep from './FileStep';
import FitStep from './FitStep';
import TuningStep, { type TunedChoice } from './TuningStep';
import type { FitAnswer, FitView, RecipeOption } from './types';

export interface StepTestWorkbenchProps {
  areas: { code: string; name: string }[];
  recipes: RecipeOption[];
  loopTypes: readonly string[];
  /** A stored test to reopen at its fits (from the list of earlier uploads). */
  initialStepTestId?: number | null;
}

/** Upload a step test, fit the models, pick one, choose tuning and save it all as evidence. */
export default function StepTestWorkbench({ areas, recipes, loopTypes, initialStepTestId = null }: StepTestWorkbenchProps) {
  const [stepTestId, setStepTestId] = useState<number | null>(initialStepTestId);
  const [fit, setFit] = useState<FitView | null>(null);
  const [answer, setAnswer] = useState<FitAnswer | null>(null);
  const [tuning, setTuning] = useState<TunedChoice | null>(null);
  const [ready, setReady] = useState(false);
  useEffect(() => setReady(true), []);

  return (
    <div data-testid="fd-workbench" data-ready={ready ? 'true' : 'false'}>
      <FileStep areas={areas} onUploaded={(id) => { setStepTestId(id); setFit(null); setTuning(null); }} />
      {stepTestId !== null && (
        <FitStep key={stepTestId} stepTestId={stepTestId} loopTypes={loopTypes} onChosen={(f, a) => { setFit(f); setAnswer(a); }} />
      )}
      {fit && answer && (
        <TuningStep key={fit.id} model={fit.model} fitId={fit.id} pvUnit={answer.stepTest.mapping.pv.unit} coUnit={answer.stepTest.mapping.co?.unit ?? '%'} onChange={setTuning} />
      )}
      {fit && answer && tuning && stepTestId !== null && (
        <EvidenceStep stepTestId={stepTestId} fitId={fit.id} tuning={tuning} recipes={recipes} matches={fit.matches}
          loopTypes={loopTypes} loopType={answer.loopType} tag={answer.stepTest.tag} />
      )}
    </div>
  );
}
