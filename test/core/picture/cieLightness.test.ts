import { describe, expect, it } from "vitest";
import { interpolateCividis } from "d3-scale-chromatic";
import { assertClose } from "../../assertClose.ts";
import { cieLightness, greyOfLightness, hexOf, rgbChannels } from "../../../src/core/picture/cieLightness.ts";
import { cividis, greyLevels } from "../../../src/core/picture/colourSchemes.ts";

describe("cieLightness (CIE 15:2004, 8.2.1.1, on sRGB with D65 white)", () => {
  it("white is L* 100 and black is L* 0 (Y = 1 gives 116 − 16; Y = 0 gives 116 · 4/29 − 16 = 0, worked by hand)", () => {
    assertClose(cieLightness("#ffffff"), 100);
    assertClose(cieLightness("#000000"), 0, { absolute: 1e-12 });
  });

  it("#777777 has L* 50.034438792538225 (worked by hand: c = 119/255, linear ((c + 0.055)/1.055)^2.4 = 0.184475, 116 · Y^(1/3) − 16)", () => {
    assertClose(cieLightness("#777777"), 50.034438792538225);
  });

  it("a dark grey below the cube-root knee, #010101, uses the linear branch: L* = 903.2963 · Y = 0.27417 (worked by hand: Y = (1/255)/12.92)", () => {
    assertClose(cieLightness("#010101"), (24389 / 27) * (1 / 255 / 12.92)); // κ = 24389/27 = 116 / (3 (6/29)^2), CIE 15:2004
  });

  it("reads rgb(r, g, b) as d3-scale-chromatic writes it, the same as the hex form", () => {
    expect(rgbChannels("rgb(127, 124, 117)")).toEqual([127, 124, 117]);
    expect(cieLightness("rgb(119, 119, 119)")).toBe(cieLightness("#777777"));
    expect(() => cieLightness("teal")).toThrow("invalid colour: teal");
  });
});

describe("greyOfLightness", () => {
  it("L* 50 is #777777, the grey whose L* (50.03) is nearest 50 (its neighbours #767676 and #787878 have 49.6 and 50.4, from cieLightness)", () => {
    expect(greyOfLightness(50)).toBe("#777777");
    expect(Math.abs(cieLightness("#777777") - 50)).toBeLessThan(Math.abs(cieLightness("#767676") - 50));
    expect(Math.abs(cieLightness("#777777") - 50)).toBeLessThan(Math.abs(cieLightness("#787878") - 50));
  });

  it("0 and 100 give black and white; out of range throws", () => {
    expect(greyOfLightness(0)).toBe("#000000");
    expect(greyOfLightness(100)).toBe("#ffffff");
    expect(() => greyOfLightness(101)).toThrow("invalid lightness: 101");
  });

  it("hexOf rounds and clamps channels", () => {
    expect(hexOf([-3, 127.5, 300])).toBe("#0080ff");
  });
});

describe("greyscale safety of the schemes", () => {
  it("cividis: CIELAB L* never decreases over 256 samples of the ramp (greyscale-safe), from about 13.4 to 91.8", () => {
    const lightness = Array.from({ length: 256 }, (_, i) => cieLightness(cividis(i / 255)));
    for (let i = 1; i < lightness.length; ++i) expect(lightness[i]!).toBeGreaterThanOrEqual(lightness[i - 1]!);
    assertClose(lightness[0]!, 13.394303103944939); // cieLightness of cividis(0) = #002051, this implementation
    assertClose(lightness[255]!, 91.7556866864473); // cieLightness of cividis(1) = #fdea45, this implementation
  });

  it("cividis: L* rises strictly across the legend's nine stops", () => {
    const lightness = Array.from({ length: 9 }, (_, i) => cieLightness(cividis(i / 8)));
    for (let i = 1; i < 9; ++i) expect(lightness[i]!).toBeGreaterThan(lightness[i - 1]!);
  });

  it("cividis(t) is d3-scale-chromatic's interpolateCividis(t) written as hex, clamped outside [0, 1]", () => {
    expect(rgbChannels(cividis(0.5))).toEqual(rgbChannels(interpolateCividis(0.5)));
    expect(cividis(-1)).toBe(cividis(0));
    expect(cividis(2)).toBe(cividis(1));
  });

  it("the six category greys sit at L* 20, 34, 48, 62, 76, 90 within half a step of 8-bit rounding (0.3), lightest last", () => {
    const lightness = greyLevels.map(cieLightness);
    assertClose(lightness, [20, 34, 48, 62, 76, 90], { absolute: 0.3 }); // the targets set in colourSchemes.ts
  });
});
