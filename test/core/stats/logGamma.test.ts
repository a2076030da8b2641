import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { logGamma } from "../../../src/core/stats/logGamma.ts";
import { assertClose } from "../../assertClose.ts";

describe("logGamma", () => {
  it("ln Γ(1/2) is ln √π = 0.5723649429247001 (the JSDoc example)", () => {
    assertClose(logGamma(0.5), 0.5723649429247001); // closed form Γ(1/2) = √π, printed
    assertClose(logGamma(0.5), 0.5 * Math.log(Math.PI)); // closed form
  });

  it("ln Γ(n) is ln (n − 1)! for n = 1 … 25", () => {
    let factorial = 1n;
    for (let n = 1; n <= 25; ++n) {
      if (n > 1) factorial *= BigInt(n - 1);
      assertClose(logGamma(n), Math.log(Number(factorial)), { absolute: 1e-14, relative: 1e-14 }); // closed form Γ(n) = (n − 1)!
    }
  });

  it("matches SciPy's gammaln at 1e-5, 0.1, 1.5, 2.5, 10, 100.5 and 1000", () => {
    assertClose(logGamma(1e-5), 11.512919692895826); // SciPy 1.17.1 scipy.special.gammaln(1e-5)
    assertClose(logGamma(0.1), 2.252712651734206); // SciPy 1.17.1 gammaln(0.1)
    assertClose(logGamma(1.5), -0.12078223763524526); // SciPy 1.17.1 gammaln(1.5)
    assertClose(logGamma(2.5), 0.2846828704729192); // SciPy 1.17.1 gammaln(2.5)
    assertClose(logGamma(10), 12.801827480081469); // SciPy 1.17.1 gammaln(10)
    assertClose(logGamma(100.5), 361.43554046777757); // SciPy 1.17.1 gammaln(100.5)
    assertClose(logGamma(1000), 5905.220423209181); // SciPy 1.17.1 gammaln(1000)
  });

  it("satisfies ln Γ(x + 1) = ln Γ(x) + ln x", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 200, noNaN: true }), (x) => {
        assertClose(logGamma(x + 1), logGamma(x) + Math.log(x), { absolute: 1e-12, relative: 1e-13 }); // the functional equation Γ(x + 1) = x Γ(x)
      }),
    );
  });

  it("x ≤ 0 or NaN throws an error naming it", () => {
    expect(() => logGamma(0)).toThrow("logGamma requires a positive argument: 0");
    expect(() => logGamma(-2.5)).toThrow("logGamma requires a positive argument: -2.5");
    expect(() => logGamma(NaN)).toThrow("logGamma requires a positive argument: NaN");
  });
});
