/**
 * Hyper-dual numbers x + x1 ε1 + x2 ε2 + x12 ε1ε2 (ε1² = ε2² = 0): exact first and
 * mixed second derivatives by forward-mode differentiation (Fike & Alonso 2011).
 * Used for the NonAnalytic CO2 terms; `first` is the ε1 part, `cross` the ε1ε2 part.
 */
export class HyperDual {
  constructor(
    readonly value: number,
    readonly first: number,
    readonly second: number,
    readonly cross: number,
  ) {}

  static constant(x: number): HyperDual {
    return new HyperDual(x, 0, 0, 0);
  }

  /** A variable seeded along ε1 with `seed1` and along ε2 with `seed2`. */
  static variable(x: number, seed1: number, seed2: number): HyperDual {
    return new HyperDual(x, seed1, seed2, 0);
  }

  add(o: HyperDual): HyperDual {
    return new HyperDual(this.value + o.value, this.first + o.first, this.second + o.second, this.cross + o.cross);
  }

  addReal(c: number): HyperDual {
    return new HyperDual(this.value + c, this.first, this.second, this.cross);
  }

  scale(c: number): HyperDual {
    return new HyperDual(this.value * c, this.first * c, this.second * c, this.cross * c);
  }

  mul(o: HyperDual): HyperDual {
    return new HyperDual(
      this.value * o.value,
      this.first * o.value + this.value * o.first,
      this.second * o.value + this.value * o.second,
      this.cross * o.value + this.first * o.second + this.second * o.first + this.value * o.cross,
    );
  }

  /** f(x) with f' and f'' given: chain rule for hyper-duals. */
  private apply(f: number, f1: number, f2: number): HyperDual {
    return new HyperDual(f, f1 * this.first, f1 * this.second, f1 * this.cross + f2 * this.first * this.second);
  }

  exp(): HyperDual {
    const e = Math.exp(this.value);
    return this.apply(e, e, e);
  }

  /** x^p for real p (x > 0). */
  pow(p: number): HyperDual {
    const x = this.value;
    const f = Math.pow(x, p);
    return this.apply(f, (p * f) / x, (p * (p - 1) * f) / (x * x));
  }
}
