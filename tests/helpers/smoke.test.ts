import { describe, it } from "vitest";
import { expectOutside } from "./validation.ts";
import { ellipticK } from "../../lib/math/elliptic.ts";

describe("test helpers", () => {
  it("expectOutside records and checks", () => {
    // source: Abramowitz & Stegun 1964, Table 17.1 (K at m = 0.5, 15 digits)
    expectOutside({ quantity: "K(m = 0.5)", source: "source: A&S 1964 Table 17.1", ours: ellipticK(0.5), reference: 1.854074677301372, rtol: 1e-14 });
  });
});
