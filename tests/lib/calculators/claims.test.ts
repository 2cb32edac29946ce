import { describe, expect, it } from 'vitest';
import { checkClaims, type LoopFigures } from '../../../src/lib/calculators/claims';
import { ClaimSchema } from '../../../src/lib/schemas/claim';

const figures: LoopFigures = {
  setpoint: { overshootPct: 4.2, riseTime: 18, settlingTime: 95, peak: 1.042, iae: 31 },
  load: { overshootPct: null, riseTime: null, settlingTime: 140, peak: -0.37, iae: 22 },
  phaseMarginDeg: 58,
  gainMargin: 2.9,
  delayMargin: 7.5,
  ms: 1.52,
  mt: 1.1,
};
const claim = (c: object) => ClaimSchema.parse(c);

describe('checkClaims', () => {
  it('checks each bound in its direction', () => {
    const checks = checkClaims(
      [
        claim({ metric: 'overshootPct', op: '<=', value: 5 }),
        claim({ metric: 'settlingTime', op: '<=', value: 90 }),
        claim({ metric: 'phaseMarginDeg', op: '>=', value: 45 }),
        claim({ metric: 'ms', op: '<=', value: 1.5 }),
      ],
      figures,
    );
    expect(checks.map((c) => c.holds)).toEqual([true, false, true, false]);
    expect(checks.map((c) => c.actual)).toEqual([4.2, 95, 58, 1.52]);
  });

  it('reads load-step claims from the load response, its peak as a magnitude', () => {
    const [peak, settle] = checkClaims(
      [claim({ metric: 'peak', op: '<=', value: 0.4, input: 'load' }), claim({ metric: 'settlingTime', op: '<=', value: 120, input: 'load' })],
      figures,
    );
    expect(peak).toMatchObject({ actual: 0.37, holds: true });
    expect(settle).toMatchObject({ actual: 140, holds: false });
  });

  it('fails a claim whose figure is undefined (a loop that never settles does not settle in time)', () => {
    const [check] = checkClaims([claim({ metric: 'overshootPct', op: '<=', value: 5, input: 'load' })], figures);
    expect(check).toMatchObject({ actual: null, holds: false });
  });
});
