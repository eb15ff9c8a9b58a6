import type { Cadence, InspectionArea, SignerRole, TemplateItem } from "@/db/schema/inspections";

/*
 * The starting checklists every shop gets, written in our own words from the common practice
 * summarised in the design's hydraulics reference §10 (daily / weekly / monthly / yearly items;
 * lockout per 29 CFR 1910.147(d)(5)(i): relieve stored energy, lower or block the ram, bleed
 * pressure, verify zero on the gauge). They are a start, not a standard: shops edit them.
 */

type Item = [key: string, area: InspectionArea, text: string, guidance: string, flags?: { critical?: boolean; photo?: boolean; lockout?: boolean }];
export type DefaultTemplate = { name: string; cadence: Cadence; signerRole: SignerRole; items: TemplateItem[] };

const item = ([key, area, text, guidance, flags = {}]: Item): TemplateItem => ({
  key,
  area,
  text,
  guidance,
  critical: flags.critical ?? false,
  photoOnFail: flags.photo ?? false,
  lockout: flags.lockout ?? false,
});

const LEAK_CAUTION = "Look with a piece of card or paper, never a hand: oil under pressure goes through skin.";

export const DEFAULT_TEMPLATES: readonly DefaultTemplate[] = [
  {
    name: "Before each use",
    cadence: "pre-use",
    signerRole: "member",
    items: (
      [
        ["oil-level", "hydraulics", "Oil level between the marks", "Read the sight glass with the ram fully up.", {}],
        ["leaks", "hoses-fittings", "No drips, wet patches or mist at hoses and fittings", LEAK_CAUTION, { critical: true, photo: true }],
        ["hose-cover", "hoses-fittings", "Hose covers whole: no rubbing, blisters, kinks or exposed wire", "Follow each hose end to end by eye.", { critical: true, photo: true }],
        ["guards", "controls-guards", "Guards and shields in place and fastened", "", { critical: true }],
        ["stop", "controls-guards", "Stop control works and the lever springs back to neutral", "Try it once with nothing between the dies.", { critical: true }],
        ["gauge-zero", "controls-guards", "Gauge reads zero with the pump stopped", "A reading above zero means trapped pressure: do not use the press.", { critical: true }],
        ["dies", "dies-tooling", "Dies seated, retained and free of cracks", "", { critical: true, photo: true }],
      ] satisfies Item[]
    ).map(item),
  },
  {
    name: "Weekly check",
    cadence: "weekly",
    signerRole: "inspector",
    items: (
      [
        ["filter", "hydraulics", "Filter indicator not in the change zone", "Note the reading if your filter has a gauge.", {}],
        ["breather", "hydraulics", "Reservoir breather clean and fitted", "", {}],
        ["oil-temp", "hydraulics", "Oil warm but not hot after a work session", "Oil that is too hot to keep a hand on the tank points to a relief valve blowing off or a worn pump.", {}],
        ["aeration", "hydraulics", "Oil clear: no foam, no milky colour", "Foam means air is drawn in; milky oil means water.", {}],
        ["pump-noise", "hydraulics", "Pump runs without whine, rattle or knocking", "", {}],
        ["leaks", "hoses-fittings", "No fresh oil at fittings, valve block or cylinder", LEAK_CAUTION, { critical: true, photo: true }],
      ] satisfies Item[]
    ).map(item),
  },
  {
    name: "Monthly inspection",
    cadence: "monthly",
    signerRole: "inspector",
    items: (
      [
        ["relief", "hydraulics", "Relief valve opens at its set pressure", "Build pressure against a block and read the gauge; the setting must stay below the lowest-rated part.", { critical: true }],
        ["rod", "hydraulics", "Cylinder rod unscored and rod seal dry", "", { critical: true, photo: true, lockout: true }],
        ["hose-restraint", "hoses-fittings", "Hoses restrained or shielded where a burst could reach a person", "", { critical: true }],
        ["bolts", "frame-welds", "Bolts and tie-rod nuts tight", "", { critical: true, lockout: true }],
        ["welds", "frame-welds", "No cracks at welds, gussets and plate edges", "Clean the paint back where a crack is suspected; photograph it.", { critical: true, photo: true, lockout: true }],
        ["die-holders", "dies-tooling", "Die holders and their bolts undamaged", "", { lockout: true }],
        ["stop", "controls-guards", "Stop control works and the lever springs back to neutral", "", { critical: true }],
        ["cable", "electrical", "Motor cable, plug and switch undamaged; earth connection sound", "", { critical: true, lockout: true }],
      ] satisfies Item[]
    ).map(item),
  },
  {
    name: "Yearly inspection",
    cadence: "yearly",
    signerRole: "inspector",
    items: (
      [
        ["hoses", "hoses-fittings", "Every hose reviewed: date stamp, cover, fittings and routing", "Replace a damaged hose assembly, never repair it.", { critical: true, photo: true, lockout: true }],
        ["oil", "hydraulics", "Oil changed, or a sample analysed", "Write the ISO 4406 code of the sample in the note.", {}],
        ["frame", "frame-welds", "Whole frame inspected, including under the bolster", "", { critical: true, photo: true, lockout: true }],
        ["isolator", "electrical", "Isolating switch works and takes a padlock", "", { critical: true, lockout: true }],
        ["lockout-review", "controls-guards", "Lockout procedure reviewed with the people who use the press", "Locks and tags on hand; everyone knows how to bleed pressure and block the ram.", { critical: true }],
      ] satisfies Item[]
    ).map(item),
  },
  {
    name: "After a modification",
    cadence: "after-modification",
    signerRole: "inspector",
    items: (
      [
        ["relief", "hydraulics", "Relief setting at or below the lowest-rated part", "Check the press record's as-built check too.", { critical: true }],
        ["new-joints", "frame-welds", "New or changed welds and bolted joints inspected", "", { critical: true, photo: true, lockout: true }],
        ["leak-test", "hoses-fittings", "New and disturbed connections dry after a run to full pressure", LEAK_CAUTION, { critical: true, photo: true }],
        ["guards", "controls-guards", "Guards refitted and the stop control works", "", { critical: true }],
        ["record", "dies-tooling", "Parts list on the press record brought up to date", "", {}],
      ] satisfies Item[]
    ).map(item),
  },
];
