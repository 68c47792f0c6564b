/** Small network fixtures for tests (raw JSON, before parsing). */

export const BANDS = 21;
export const bands = (f: (b: number) => number) => Array.from({ length: BANDS }, (_, b) => f(b));
export const flat = (v: number) => bands(() => v);
/** A TL rising 1 dB per band from `at50`. */
export const rising = (at50: number, slope = 1) => bands((b) => at50 + slope * b);

export const room = (id: string, absorption: number, extra: Record<string, unknown> = {}) => ({ id, kind: "room", volume_m3: 50, absorption_m2: absorption, ...extra });
export const wall = (id: string, a: string, b: string, area: number, tl: number[]) => ({ id, between: [a, b], parts: [{ area_m2: area, tl_db: tl }] });

/** The minimal form (must always parse). */
export const minimalNetwork = () => ({
  spaces: [
    { id: "cafe", kind: "room", volume_m3: 60, rt60_s: 0.6 },
    { id: "studio", kind: "room", volume_m3: 50, absorption_m2: 16 },
    { id: "void", kind: "void", volume_m3: 30, absorption_m2: 6 },
    { id: "street", kind: "outdoors" },
  ],
  links: [{ id: "party-wall", between: ["cafe", "studio"], parts: [{ area_m2: 10, tl_db: rising(30) }, { area_m2: 0.01, open: true }] }],
  sources: [{ space: "cafe", levels_db: flat(85) }],
});

export const chainOfThree = () => ({
  spaces: [room("a", 20), room("b", 12), room("c", 15)],
  links: [wall("ab", "a", "b", 10, rising(25)), wall("bc", "b", "c", 12, rising(20, 1.5))],
  sources: [{ space: "a", levels_db: flat(90) }],
});

export const loopOfFour = () => ({
  spaces: [room("a", 20), room("b", 10), room("c", 14), room("d", 9)],
  links: [
    wall("ab", "a", "b", 10, rising(20)),
    wall("bc", "b", "c", 8, rising(15)),
    wall("cd", "c", "d", 9, rising(18)),
    wall("da", "d", "a", 11, rising(22)),
  ],
  sources: [{ space: "a", levels_db: flat(90) }],
});

export const plenum = () => ({
  spaces: [room("office", 18), room("meeting", 14), { id: "void", kind: "void", volume_m3: 30, absorption_m2: 8 }],
  links: [
    wall("partition", "office", "meeting", 12, rising(35)),
    { id: "office-tiles", between: ["office", "void"], parts: [{ area_m2: 20, tl_db: rising(8, 0.5) }, { area_m2: 0.05, open: true }] },
    { id: "meeting-tiles", between: ["void", "meeting"], parts: [{ area_m2: 18, tl_db: rising(8, 0.5) }] },
  ],
  sources: [{ space: "office", levels_db: flat(80) }],
});

export const ventLink = () => ({
  spaces: [room("cafe-back", 15), room("studio", 12)],
  links: [
    wall("wall", "cafe-back", "studio", 10, rising(40)),
    { id: "duct", type: "vent", between: ["cafe-back", "studio"], open_area_m2: 0.06, attenuation_db: bands((b) => 2 + 0.8 * b) },
  ],
  sources: [{ space: "cafe-back", levels_db: flat(88) }],
});
