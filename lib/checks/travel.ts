/**
 * travel.seats — in the travel arrangement, everyone who sleeps in the van needs a belted seat:
 * the cab seats (bay.cabSeats, default 2) plus travel seats that are belted (`props.belted`, the
 * kind's default being belted — the same reading as the weight plan's).
 * Warns when the sleepers outnumber them, and always carries the caution that seats used while
 * driving must be approved and anchored as local vehicle rules require (SOURCES.seats).
 * Pure: must never import UI, framework or database code.
 */
import { beltedTravelSeats } from '../planning/module-facts';
import { inArrangement } from '../layout/bay';
import type { CheckContext } from './context';
import { listNames, moduleName, plural } from './naming';
import { SOURCES } from './sources';
import type { Finding } from './types';

const CAUTION =
  'Seats used while driving must be approved and anchored as local vehicle rules require: type-approved seats, belts and anchorages, fitted to the manufacturer’s instructions and inspected where the law asks for it.';

export function travelSeats(ctx: CheckContext): Finding {
  const cab = ctx.doc.bay.cabSeats ?? 2;
  const seats = ctx.doc.modules.filter((m) => m.kind === 'seat' && inArrangement(m, 'travel'));
  // One reading of "belted" for the checks and the weight plan: the kind's default (belted) unless the module says otherwise.
  const belted = beltedTravelSeats(ctx.doc);
  const unbelted = seats.filter((m) => !belted.includes(m));
  const total = cab + belted.length;
  const people = ctx.doc.occupants.sleepers.length;
  const counted = `${plural(cab, 'cab seat')}${belted.length ? ` + ${plural(belted.length, 'belted seat')} (${listNames(belted.map(moduleName), 4)})` : ''}`;
  const notCounted = unbelted.length ? ` ${listNames(unbelted.map(moduleName), 4)} ${unbelted.length === 1 ? 'is' : 'are'} not marked belted and not counted.` : '';
  const who = people === 0 ? 'No sleepers are listed, so nobody is counted as travelling.' : `${plural(people, 'sleeper')} travel${people === 1 ? 's' : ''} with the van.`;
  const short = people > total;
  return {
    id: 'travel.seats',
    status: short ? 'warn' : 'pass',
    arrangement: 'travel',
    moduleIds: seats.map((m) => m.id),
    measured: total,
    required: people,
    unit: 'seats',
    message: `${who} Belted seats in travel: ${total} (${counted}); ${short ? `${people - total} short` : 'enough'}.${notCounted} ${CAUTION} ${SOURCES.seats.brief}.`,
    source: SOURCES.seats.cite,
  };
}
