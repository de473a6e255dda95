import { directStepProfile, normalDepth, prismaticSection } from '@/lib/hydraulics';
import { directStepMarch } from '@/lib/hydraulics/profiles/direct-step-march';
import { geometricDepths } from '@/lib/hydraulics/profiles/depth-grid';
const section = prismaticSection({ shape: 'trapezoidal', bottomWidth: 10, sideSlope: 2 }, 0.035);
function time(label: string, f: () => void) { for (let i = 0; i < 2000; i++) f(); const t = performance.now(); let n = 0; while (performance.now() - t < 500) { f(); n++; } const us = (performance.now() - t) / n * 1000; console.log(label, us.toFixed(2), 'µs'); return us; }
const yn = normalDepth(section, 38, 0.0006);
const G = 9.80665;
function floor(steps: number): number {
  const b = 10, z = 2, n = 0.035, Q = 38, S0 = 0.0006, y0 = 2.95, yEnd = yn * 1.01;
  const k = 2 * Math.sqrt(1 + z * z);
  const ratio = Math.pow((yEnd - yn) / (y0 - yn), 1 / steps);
  let y = y0, A = b * y + z * y * y, P = b + k * y, V = Q / A;
  let E = y + V * V / (2 * G); let K = A * Math.pow(A / P, 2 / 3) / n; let Sf = (Q / K) ** 2;
  let x = 0; let d = y0 - yn;
  for (let i = 1; i <= steps; i++) {
    d *= ratio; const y2 = yn + d;
    const A2 = b * y2 + z * y2 * y2, P2 = b + k * y2, V2 = Q / A2;
    const E2 = y2 + V2 * V2 / (2 * G); const K2 = A2 * Math.pow(A2 / P2, 2 / 3) / n; const Sf2 = (Q / K2) ** 2;
    x += (E - E2) / (S0 - (Sf + Sf2) / 2); E = E2; Sf = Sf2;
  }
  return x;
}
console.log(floor(48), floor(1<<16));
const reach = { section, discharge: 38, bedSlope: 0.0006, bedLevelAtControl: 31.2, reachLength: 12000 };
const f48 = time('floor48', () => floor(48));
const m = time('march48', () => directStepMarch(reach, geometricDepths(2.95, yn * 1.01, yn, 48), { endDepth: yn * 1.01, endsBy: 'normal-depth', maxSteps: 48 }));
const input = { section, discharge: 38, bedSlope: 0.0006, controlDepth: 2.95, bedLevelAtControl: 31.2, reachLength: 12_000, normalDepthTolerance: 0.01, skipSelfCheck: true };
const p = time('profile', () => directStepProfile(input));
console.log('ratio', p / f48, m / f48);
