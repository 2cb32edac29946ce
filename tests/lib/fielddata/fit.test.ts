import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fitPlot, fitSeries } from '../../../src/lib/fielddata/fit';
import { loadSeries, storeStepTest } from '../../../src/lib/fielddata/upload';
import { stepTestFolder } from '../../../src/lib/fielddata/storage';
import { seed as seedAreas } from '../../../src/lib/db/seeds/01-plant-areas';
import { tempDatabase } from '../../support/temp-db';
import { toCsv, type GeneratedTest } from '../../support/step-test-csv';

/**
 * Generated step tests (closed forms plus seeded Gaussian noise, see tests/support/step-test-csv.ts)
 * go through the upload path (CSV text → stored file → series read back) and are fitted; the true
 * parameters must come back within the stated tolerances.
 */
interface Row {
  name: string;
  test: GeneratedTest;
  style: { european?: boolean; timestamps?: boolean };
  /** Relative tolerance on gains and time constants; absolute on θ (s). */
  tol: { k: number; tau: number; theta: number };
}

const rows: Row[] = [
  {
    name: 'HTST hot-water TIC-210, FOPDT K=0.42 °C/%, τ=30 s, θ=4 s, 0.5 s samples, σ=0.02 °C, semicolons and decimal commas',
    test: { model: { type: 'fopdt', k: 0.42, tau: 30, theta: 4 }, dt: 0.5, n: 400, stepAt: 20, u0: 40, u1: 45, y0: 71.8, sigma: 0.02, seed: 11 },
    style: { european: true },
    tol: { k: 0.02, tau: 0.04, theta: 0.5 },
  },
  {
    name: 'CIP supply temperature TIC-420, SOPDT K=1.6, τ1=80 s, τ2=20 s, θ=10 s, 1 s samples, σ=0.05 °C, timestamps',
    test: { model: { type: 'sopdt', k: 1.6, tau1: 80, tau2: 20, theta: 10 }, dt: 1, n: 700, stepAt: 30, u0: 30, u1: 36, y0: 62, sigma: 0.05, seed: 23 },
    style: { timestamps: true },
    tol: { k: 0.03, tau: 0.15, theta: 2.5 },
  },
  {
    name: 'Balance-tank level LIC-301, IPDT K=0.004 %/s per %, θ=6 s, 1 s samples, σ=0.05 %',
    test: { model: { type: 'ipdt', k: 0.004, theta: 6 }, dt: 1, n: 400, stepAt: 20, u0: 50, u1: 60, y0: 45, sigma: 0.05, seed: 5 },
    style: {},
    tol: { k: 0.03, tau: 0, theta: 1.5 },
  },
];

let db: Awaited<ReturnType<typeof tempDatabase>>;
beforeAll(async () => {
  db = await tempDatabase();
  await seedAreas(db.knex);
});
afterAll(async () => db.cleanup());

describe('fitSeries', () => {
  for (const row of rows) {
    it(`recovers ${row.name}`, async () => {
      const folder = stepTestFolder(db.file);
      const bytes = new TextEncoder().encode(toCsv(row.test, row.style));
      const mapping = { time: { column: 1, unit: row.style.timestamps ? 'timestamp' : 's' }, pv: { column: 2, unit: '°C' }, co: { column: 3, unit: '%' } } as const;
      const stored = await storeStepTest(db.knex, folder, { bytes, originalName: 'test.csv', details: { tag: 'TIC-210', area: 'htst', note: '', mapping }, uploadedBy: 'a@b.example' });
      expect(stored.ok).toBe(true);
      if (!stored.ok) return;
      const series = loadSeries(folder, stored.stepTest);
      const [fit] = fitSeries(series, [row.test.model.type]);
      expect(fit.error).toBe(null);
      const m = fit.model!;
      const truth = row.test.model;
      expect(Math.abs(m.k / truth.k - 1)).toBeLessThan(row.tol.k);
      expect(Math.abs(m.theta - truth.theta)).toBeLessThan(row.tol.theta);
      if (m.type === 'fopdt' && truth.type === 'fopdt') expect(Math.abs(m.tau / truth.tau - 1)).toBeLessThan(row.tol.tau);
      if (m.type === 'sopdt' && truth.type === 'sopdt') {
        // τ1 + τ2 is well determined by a step test even when the split between them is less so.
        expect(Math.abs((m.tau1 + m.tau2) / (truth.tau1 + truth.tau2) - 1)).toBeLessThan(row.tol.tau);
      }
      // With white noise of σ, a good fit leaves residuals of about σ.
      expect(fit.fit!.rmse).toBeLessThan(row.test.sigma * 1.3);
      expect(fit.fit!.rmse).toBeGreaterThan(row.test.sigma * 0.7);
    });
  }

  it('fits all three models and reports each one, and the plot carries each curve and residual', async () => {
    const g = rows[0].test;
    const folder = stepTestFolder(db.file);
    const mapping = { time: { column: 1, unit: 's' }, pv: { column: 2, unit: '°C' }, co: { column: 3, unit: '%' } } as const;
    const stored = await storeStepTest(db.knex, folder, { bytes: new TextEncoder().encode(toCsv(g, { european: true })), originalName: 'x.csv', details: { tag: 'TIC-210', area: 'htst', note: '', mapping }, uploadedBy: 'a@b.example' });
    if (!stored.ok) throw new Error('upload failed');
    const fits = fitSeries(stored.series);
    expect(fits.map((f) => f.type)).toEqual(['fopdt', 'sopdt', 'ipdt']);
    const good = fits.filter((f) => f.model !== null) as { type: 'fopdt'; model: NonNullable<(typeof fits)[0]['model']> }[];
    const plot = fitPlot(stored.series, good);
    expect(plot.t.length).toBe(400);
    const fopdt = plot.curves.find((c) => c.type === 'fopdt')!;
    const rms = Math.sqrt(fopdt.residual.reduce((a, r) => a + r * r, 0) / fopdt.residual.length);
    expect(rms).toBeCloseTo(fits[0].fit!.rmse, 3);
    // The FOPDT truth fits better than a pure integrator.
    expect(fits[0].fit!.rmse).toBeLessThan(fits[2].fit!.rmse ?? Infinity);
  });
});
