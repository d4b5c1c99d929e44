/**
 * Where each rule's numbers come from, as the strings a finding carries in `source`. Every value
 * names its published source (standard and clause, handbook table, published chart) or says
 * plainly that it is common practice or from memory; secondary citations are marked as such.
 * Pure text; must never import UI, framework or database code.
 */

export interface Source {
  /** The full citation, for `Finding.source`. */
  cite: string;
  /** A few words for the end of a message. */
  brief: string;
}

export const SOURCES = {
  /** Walkway / escape width default. */
  walkwayMin: { brief: 'Walkway minimum from memory (EN 1646-1, clause not checked)', cite: 'EN 1646-1 (leisure accommodation vehicles — motor caravans — habitation requirements relating to health and safety): 450 mm walkway and escape width — from memory, clause not checked; EN 1645-1 is the touring-caravan counterpart and does not apply to a van conversion' },
  walkwayComfort: { brief: 'Common practice, no source', cite: 'Common practice, no source: a comfortable walkway is 500–600 mm, i.e. at least the minimum plus 100 mm' },
  armReach: { brief: 'Common practice, no source', cite: 'Common practice, no source: a person works a unit standing within 700 mm (arm’s reach) of its front, squarely in front of it' },
  floorBlock: { brief: 'Common practice, no source', cite: 'Common practice, no source: anything with its underside below 1000 mm above the floor is in the way of feet and legs' },
  headroom: { brief: 'Common practice, no source', cite: 'Common practice, no source: clear standing height = bare-metal height − floor build-up − roof build-up, compared with the tallest person’s stature plus a margin' },
  headStrike: { brief: 'Common practice, no source', cite: 'Common practice, no source: a fixture whose underside is below the tallest person’s stature and that hangs over the walkway is a head strike' },
  statureTables: { brief: 'Pheasant & Haslegrave, Bodyspace, Table 10.1 (from memory)', cite: 'Stature of British adults aged 19–65: Pheasant & Haslegrave, Bodyspace, 3rd ed. (2006), Table 10.1 (men 5th/50th/95th percentile 1625/1740/1855 mm, women 1505/1610/1710 mm) — from memory; shoe allowance 25 mm (men), from memory' },
  bedLength: { brief: 'Common practice, no source', cite: 'Common practice, no source: a bed should be at least 100 mm longer than the tallest person sleeping in it' },
  bedWidth: { brief: 'Common practice, no source', cite: 'Common practice, no source: about 600 mm of bed width per sleeper' },
  bedLevel: { brief: 'Common practice, no source', cite: 'Common practice, no source: boards and cushions made up into one bed should sit level to within 20 mm; pieces closer than that in plan count as one bed and the mattress bridges the seam' },
  mattressUk: { brief: 'UK trade sizes, common practice', cite: 'UK mattress sizes (single 90 × 190, small double 120 × 190, double 135 × 190, king 150 × 200, super king 180 × 200 cm): the sizes the UK bed trade sells — common practice, no published standard consulted; mattresses are measured as BS EN 1334 describes (from memory)' },
  mattressEu: { brief: 'Continental trade sizes, common practice', cite: 'Continental European mattress sizes (90, 140, 160, 180 × 200 cm): the sizes the trade sells — common practice, no single standard fixes them; mattresses are measured as EN 1334 describes (from memory)' },
  mattressUs: { brief: 'US trade sizes, common practice', cite: 'US mattress sizes (twin 38 × 75, full 54 × 75, queen 60 × 80, king 76 × 80, California king 72 × 84 in): the sizes the US bed trade sells — common practice, no published standard consulted; 25.4 mm to the inch exactly (international yard and pound agreement, 1959)' },
  egress: { brief: 'Common practice, no source', cite: 'Common practice, no source: from every bed a way out — the bed next to a door, or a clear corridor at least 400 mm wide to one; check your local rules for escape routes in habitation vehicles' },
  placeStep: { brief: 'Common practice, no source', cite: 'Common practice, no source: sleep pieces whose tops step by more than 150 mm (deeper than a van mattress) are separate sleeping places — a high bed, a bunk — not one bed' },
  sittingHeight: { brief: 'Pheasant & Haslegrave, Bodyspace, Table 10.1 (from memory)', cite: 'Sitting height (seat to crown of the head, sitting erect) of British adults aged 19–65: Pheasant & Haslegrave, Bodyspace, 3rd ed. (2006), Table 10.1 — men 5th/50th/95th percentile 850/910/965 mm, women 795/850/910 mm — from memory; the 95th-percentile man (965 mm) is the one compared. Measured from the mattress top as drawn (a soft mattress gives a little more)' },
  climb: { brief: 'EN 747-1, from memory', cite: 'EN 747-1 (bunk beds and high beds for domestic use): a bed whose base is 800 mm or more above the floor is a high bed and needs a ladder or steps — from memory, clause not checked; household furniture, applied here by analogy. Compared at the mattress top, which errs towards asking for a ladder' },
  underFloor: { brief: 'Common practice, no source', cite: 'Common practice, no source: a large panel van’s load floor sits about 550 mm above the road unladen; an underslung tank or cylinder should keep at least 200 mm of ground clearance and stay clear of the wheels’ movement under the arches. Measure your own van laden, and fix to the chassis only as the vehicle maker allows' },
  roofLoad: { brief: 'Vehicle maker’s roof load', cite: 'The roof load the vehicle maker states in the owner’s handbook (no general figure); a roof box or solar frame counts in it with its rack' },
  rearProjection: { brief: 'From memory: UK Construction and Use rules', cite: 'A load projecting more than 1 m behind the vehicle must be made clearly visible, and more than 2 m needs marker boards: Road Vehicles (Construction and Use) Regulations 1986, reg. 82 (UK) — from memory, regulation text not consulted; other countries set their own limits' },
  solarEdge: { brief: 'Common practice, no source; the panel maker’s mounting instructions decide', cite: 'Common practice, no source: a solar panel on a van roof kept at least 50 mm in from every edge of the roof, where the roof curves down and the gutter runs. The panel maker’s mounting instructions and the vehicle maker’s roof rules decide where it may be fixed' },
  solarOpening: { brief: 'Common practice, no source', cite: 'Common practice, no source: at least 100 mm kept clear around a roof vent, fan or skylight, so its lid can open and the panel neither shades it nor is shaded by it; the opening’s maker may ask for more' },
  seats: { brief: 'Common practice; follow your local vehicle rules', cite: 'Common practice: everyone travelling needs a belted seat. Seats used while driving must be type-approved and anchored as local vehicle rules require (in Europe UN ECE Regulations 14 (anchorages), 16 (belts) and 17 (seats) — from memory); have the fitting inspected by a qualified tester' },
  geometry: { brief: 'Layout geometry, no outside source', cite: 'Layout geometry: the lined interior after wall and roof build-up (no outside source)' },
  wheelArch: { brief: 'Layout geometry, no outside source', cite: 'Layout geometry: a module standing over a wheel arch must clear the arch box (no outside source; measure your own van’s arches)' },
  overlap: { brief: 'Layout geometry, no outside source', cite: 'Layout geometry: two solid modules cannot share space (no outside source)' },
  windowCover: { brief: 'Common practice, no source', cite: 'Common practice, no source: a module standing within 300 mm of a wall hides the part of a window it covers in elevation; more than a quarter of the glass hidden is worth a second look, and an overhead locker across a window blinds it whatever the share' },
  roofOpening: { brief: 'Common practice, no source', cite: 'Common practice, no source: keep 300 mm clear under a roof vent, fan or skylight’s inside frame to reach its handle and let it open and draw air; a frame hanging below the tallest person’s stature over floor a person stands on is a head strike' },
  exhaust: { brief: 'Common practice, no source; follow the heater’s installation manual', cite: 'Common practice, no source: a heater exhaust outlet at least 300 mm from any opening window, door or roof opening, and 500 mm from the fuel filler. Heater makers’ installation manuals and the vehicle-heater rules (UN ECE Regulation No. 122) set their own distances — not consulted here; the manual of the heater fitted decides' },
  gasVent: { brief: 'Common practice, no source; EN 1949 and the installer decide', cite: 'Common practice, no source: a gas locker’s drop-out vent at least 500 mm from any opening window, door, roof opening, the fuel filler and a heater exhaust. EN 1949 (LPG installations in habitation vehicles) covers locker venting — its clauses were not consulted here; the installer applies the standard in force' },
  intake: { brief: 'Common practice, no source; follow the heater’s installation manual', cite: 'Common practice, no source: a heater’s combustion-air intake at least 300 mm from its exhaust outlet, so it does not breathe its own fumes. The heater maker’s installation manual sets the distance for that heater — not consulted here' },
} as const satisfies Record<string, Source>;
