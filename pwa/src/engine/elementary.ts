/**
 * Value, first and second derivative of each elementary function at a real point: the only
 * calculus the scalar types need. With every perturbation part of size STEP, the complex and
 * bicomplex functions equal these Taylor terms to rounding (REFERENCES §1), and derivatives
 * are written with sinh/cosh rather than 1 − tanh² so they keep their digits at large arguments.
 */
export type Jet = readonly [value: number, first: number, second: number];

export const jets = {
  exp(a: number): Jet {
    const e = Math.exp(a);
    return [e, e, e];
  },
  log(a: number): Jet {
    // Outside the domain every part is undefined, not just the value: a complex step of
    // ln|a| would otherwise pass for a derivative.
    if (a < 0) return [Number.NaN, Number.NaN, Number.NaN];
    return [Math.log(a), 1 / a, -1 / (a * a)];
  },
  sqrt(a: number): Jet {
    const s = Math.sqrt(a);
    return [s, 0.5 / s, -0.25 / (s * a)];
  },
  sin(a: number): Jet {
    const s = Math.sin(a);
    return [s, Math.cos(a), -s];
  },
  cos(a: number): Jet {
    const c = Math.cos(a);
    return [c, -Math.sin(a), -c];
  },
  sinh(a: number): Jet {
    const s = Math.sinh(a);
    return [s, Math.cosh(a), s];
  },
  cosh(a: number): Jet {
    const c = Math.cosh(a);
    return [c, Math.sinh(a), c];
  },
  tanh(a: number): Jet {
    const t = Math.tanh(a);
    const c = Math.cosh(a);
    const sech2 = 1 / (c * c);
    return [t, sech2, -2 * t * sech2];
  },
  coth(a: number): Jet {
    const t = 1 / Math.tanh(a);
    const s = Math.sinh(a);
    const csch2 = 1 / (s * s);
    return [t, -csch2, 2 * t * csch2];
  },
  reciprocal(a: number): Jet {
    const r = 1 / a;
    return [r, -r * r, 2 * r * r * r];
  },
  /** a^p for a real exponent p other than 0 and 1 (those are handled by the callers). */
  power(a: number, p: number): Jet {
    if (a === 0) return [0, p * 0 ** (p - 1), p * (p - 1) * 0 ** (p - 2)];
    // From the value down, so a large |a| with p < 0 does not underflow a^(p−2) first.
    const value = a ** p;
    const first = (p * value) / a;
    return [value, first, ((p - 1) * first) / a];
  },
};
