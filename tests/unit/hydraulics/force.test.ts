import { describe, expect, it } from "vitest";
import { convert } from "@/lib/units";
import {
  annulusAreaMm2,
  areaForForceMm2,
  circleAreaMm2,
  cylinderAreas,
  forceInTons,
  forceKn,
  pressureForForceBar,
} from "@/lib/hydraulics/force";
import { expectPrinted, expectRel, in2FromMm2, inToMm, knToLbf, lbfToKn, psiToBar } from "./helpers";

describe("cylinder force F = p·A (reference §1)", () => {
  const bore4in = circleAreaMm2(inToMm(4));
  const force = forceKn(psiToBar(2500), bore4in);

  it("4 in bore at 2500 psi, as published", () => {
    // Source: [EH] ehow.com press force in tons (a); π≈3.14 there, so printed rounding (trap 6)
    expectPrinted(knToLbf(force), 31_400, -2);
    expectPrinted(forceInTons(force).shortTons, 15.7, 1);
  });

  it("4 in bore at 2500 psi, at full precision", () => {
    expectRel(knToLbf(force), 31_415.9); // computed from formula (b)
    expectRel(forceInTons(force).shortTons, 15.708); // computed from formula (b)
    expectRel(forceInTons(force).tonnesForce, 14.25); // computed from formula (b)
    expectRel(force, 139.75); // computed from formula (b)
  });

  it("1.5 in bore, 5/8 in rod at 3000 psi: areas and retract force", () => {
    // Source: [IMD] as keyed in hydraulics-reference.md §1 (a), printed rounding
    expectPrinted(in2FromMm2(circleAreaMm2(inToMm(1.5))), 1.767, 3);
    const annulus = annulusAreaMm2(inToMm(1.5), inToMm(0.625));
    expectPrinted(in2FromMm2(annulus), 1.46, 3);
    expectPrinted(knToLbf(forceKn(psiToBar(3000), annulus)), 4_380, -1);
  });

  it("4 in bore, 2 in rod at 2500 psi: retract on the annulus (trap 3)", () => {
    const annulus = annulusAreaMm2(inToMm(4), inToMm(2));
    expectRel(in2FromMm2(annulus), 9.4248); // computed from formula (b)
    expectRel(knToLbf(forceKn(psiToBar(2500), annulus)), 23_562); // computed from formula (b)
    expect(forceKn(100, annulus)).toBeLessThan(forceKn(100, circleAreaMm2(inToMm(4))));
  });

  it("1 bar on 10,000 mm² is 1 kN (bar = 0.1 N/mm²)", () => {
    expect(forceKn(1, 10_000)).toBe(1); // computed from formula: unit definition (b)
  });
});

describe("parallel cylinders add their areas", () => {
  it("three cylinders give three times the force of one", () => {
    const one = cylinderAreas({ count: 1, boreMm: 80, rodMm: 45 });
    const three = cylinderAreas({ count: 3, boreMm: 80, rodMm: 45 });
    expectRel(three.capMm2, 3 * one.capMm2, 1e-12); // computed from formula (b)
    expectRel(three.annulusMm2, 3 * one.annulusMm2, 1e-12);
    expectRel(forceKn(200, three.capMm2), 3 * forceKn(200, one.capMm2), 1e-12);
  });
});

describe("inverse force relations", () => {
  it("pressure for a force undoes force for a pressure", () => {
    const area = circleAreaMm2(100);
    expectRel(pressureForForceBar(forceKn(210, area), area), 210, 1e-12); // computed from formula (b)
    expectRel(areaForForceMm2(forceKn(210, area), 210), area, 1e-12);
  });

  it("2.5 in ram needs 629.3 bar for 20 long tons", () => {
    // Source: [ITI] itidirect.co.uk "ram gauges" (a): 9,126 psi, 629.3 bar
    const bar = pressureForForceBar(convert("force", 20, "longTon", "kN"), circleAreaMm2(inToMm(2.5)));
    expectPrinted(bar, 629.3, 1);
    const psi = convert("pressure", bar, "bar", "psi");
    expect(Math.abs(psi - 9_126)).toBeLessThan(1); // the source truncates (9,126.6)
  });

  it("short tons from a gauge: tons = psi · A / 2000; psi per ton = 2000 / A (§9)", () => {
    const areaIn2 = Math.PI; // 2 in bore
    const kn = forceKn(psiToBar(1000), circleAreaMm2(inToMm(2)));
    expectRel(forceInTons(kn).shortTons, (1000 * areaIn2) / 2000, 1e-9); // computed from formula (b)
    expectRel(convert("pressure", pressureForForceBar(lbfToKn(2000), circleAreaMm2(inToMm(2))), "bar", "psi"), 2000 / areaIn2, 1e-9);
  });
});
