// The undamped elastoplastic oscillator under a half-sine pulse of force, a0·sin(Ωt) per unit mass
// for 0 ≤ t ≤ t_d (Ω = π/t_d), from rest, in closed form branch by branch; only the event times
// are found numerically (a fine scan, then bisection). Closed form (derived here; the elastic part
// is the textbook half-sine response, Chopra, Dynamics of Structures, §4.x, from memory):
//   elastic (x = u − offset):  x'' + ω²x = p(t)
//     in the pulse:  x = C·cos ω(t − t₀) + D·sin ω(t − t₀) + P·sin Ωt,  P = a0/(ω² − Ω²)  (Ω ≠ ω)
//                    C = x₀ − P·sin Ωt₀,  D = (v₀ − PΩ·cos Ωt₀)/ω;  after it the same with P = 0
//   yielding (σ = ±1, spring force σ·ω²u_y):  u'' = p(t) − σω²u_y
//     in the pulse:  u' = v₀ + (a0/Ω)(cos Ωt₀ − cos Ωt) − σω²u_y(t − t₀)
//                    u  = u₀ + (v₀ + (a0/Ω)·cos Ωt₀)(t − t₀) − (a0/Ω²)(sin Ωt − sin Ωt₀) − ½σω²u_y(t − t₀)²
//     after it the same with a0 = 0.
// Events: an elastic spring yields when |x| reaches u_y; a yielding one unloads when u' reaches 0.

export interface HalfSine {
  omega: number;
  a0: number;
  tdS: number;
  /** Yield displacement, m (Infinity: elastic). */
  uyM: number;
  /** Where to stop, s. */
  endS: number;
}

type Motion = (t: number) => [number, number];

export function halfSineElastoplasticPeak({ omega, a0, tdS, uyM, endS }: HalfSine) {
  const w = Math.PI / tdS;
  const w2 = omega * omega;
  const scan = Math.min((2 * Math.PI) / omega, tdS) / 2000;
  const slack = Number.isFinite(uyM) ? 1e-13 * uyM : 0;
  let t0 = 0;
  let u0 = 0;
  let v0 = 0;
  let branch = 0;
  let offset = 0;
  let peak = 0;
  let yieldEvents = 0;

  /** The motion of the current branch from (t0, u0, v0), valid up to the pulse end or after it. */
  const motionFrom = (inPulse: boolean): Motion => {
    const force = inPulse ? a0 : 0;
    if (branch === 0) {
      const p = force / (w2 - w * w);
      const c = u0 - offset - p * Math.sin(w * t0);
      const d = (v0 - p * w * Math.cos(w * t0)) / omega;
      return (t) => {
        const phase = omega * (t - t0);
        return [
          offset + c * Math.cos(phase) + d * Math.sin(phase) + p * Math.sin(w * t),
          -c * omega * Math.sin(phase) + d * omega * Math.cos(phase) + p * w * Math.cos(w * t),
        ];
      };
    }
    const plateau = branch * w2 * uyM;
    const start = v0 + (force / w) * Math.cos(w * t0);
    return (t) => {
      const tau = t - t0;
      return [
        u0 +
          start * tau -
          (force / (w * w)) * (Math.sin(w * t) - Math.sin(w * t0)) -
          0.5 * plateau * tau * tau,
        v0 + (force / w) * (Math.cos(w * t0) - Math.cos(w * t)) - plateau * tau,
      ];
    };
  };

  while (t0 < endS) {
    const inPulse = t0 < tdS;
    const segmentEnd = inPulse ? tdS : endS;
    const motion = motionFrom(inPulse);
    // The event function of the branch: > 0 once the event has happened.
    const past =
      branch === 0
        ? (t: number) => Math.abs(motion(t)[0] - offset) - uyM - slack
        : (t: number) => -branch * motion(t)[1];
    let event = Number.NaN;
    let a = t0;
    let vA = motion(a)[1];
    while (a < segmentEnd && Number.isNaN(event)) {
      const b = Math.min(a + scan, segmentEnd);
      const [uB, vB] = motion(b);
      let crossing = past(b) > 0 ? b : Number.NaN;
      if (branch === 0 && vA * vB < 0) {
        const turn = bisect((t) => motion(t)[1], a, b);
        if (past(turn) > 0) crossing = turn;
        else peak = Math.max(peak, Math.abs(motion(turn)[0]));
      }
      if (!Number.isNaN(crossing)) event = bisect(past, a, crossing);
      else peak = Math.max(peak, Math.abs(uB));
      a = b;
      vA = vB;
    }
    if (Number.isNaN(event)) {
      [u0, v0] = motion(segmentEnd);
      t0 = segmentEnd;
      continue;
    }
    [u0, v0] = motion(event);
    peak = Math.max(peak, Math.abs(u0));
    t0 = event;
    if (branch === 0) {
      branch = u0 - offset > 0 ? 1 : -1;
      yieldEvents++;
    } else {
      offset = u0 - branch * uyM;
      branch = 0;
    }
  }
  return { peakM: peak, yieldEvents };
}

/** The root of g in [a, b] (g(a) ≤ 0 < g(b), or a sign change) by bisection, to the last bits. */
function bisect(g: (t: number) => number, a: number, b: number): number {
  const negativeAtA = g(a) <= 0;
  for (let i = 0; i < 200 && b - a > 1e-15 * Math.max(1, Math.abs(b)); i++) {
    const m = (a + b) / 2;
    if (g(m) <= 0 === negativeAtA) a = m;
    else b = m;
  }
  return b;
}
