import { formatInches } from '@tubwright/shared/units';
import { centsToInput, parseMoneyToCents, unitsToCents } from '../core/money';
import type { ForSaleAnimal, PlanListItem, PriceListItem, QuoteLine, QuoteLineKind } from '../core/orders-types';

/** A line while the quote is being written; prices stay as typed until saved. */
export interface DraftLine {
  key: number;
  kind: QuoteLineKind;
  /** Empty for a rack line: the server describes the rack from its plan. */
  description: string;
  /** Where the line came from, for the person writing the quote. */
  origin: string;
  planId: number | null;
  spec: Record<string, unknown> | null;
  animalId: number | null;
  quantity: number;
  /** What the person typed; empty means the server's price (calculator or the shop's delivery fee). */
  priceText: string;
  /** The price the server is expected to use when priceText is empty. */
  suggestedCents: number | null;
}

let nextKey = 1;
const draft = (line: Omit<DraftLine, 'key'>): DraftLine => ({ key: nextKey++, ...line });

export function planLine(plan: PlanListItem, quantity: number): DraftLine {
  return draft({
    kind: 'rack',
    description: '',
    origin: `Saved plan “${plan.name}”, version ${plan.version}: ${plan.summary.levels} x ${plan.summary.columns} tubs`,
    planId: plan.id,
    spec: null,
    animalId: null,
    quantity,
    priceText: '',
    suggestedCents: unitsToCents(plan.summary.total),
  });
}

export interface TubSpec {
  lengthIn: number;
  widthIn: number;
  heightIn: number;
  levels: number;
  columns: number;
}

/** The smallest rack-plan request: a tub and a layout, everything else the calculator's defaults. */
export function specFor(tub: TubSpec): Record<string, unknown> {
  return { unit: 'in', tub: { length: tub.lengthIn, width: tub.widthIn, height: tub.heightIn }, layout: { levels: tub.levels, columns: tub.columns } };
}

export function specLine(tub: TubSpec, quantity: number, priceCents: number, description: string): DraftLine {
  const f = (n: number) => formatInches(n);
  return draft({
    kind: 'rack',
    description: '',
    origin: `${description} (tub ${f(tub.lengthIn)} x ${f(tub.widthIn)} x ${f(tub.heightIn)} in)`,
    planId: null,
    spec: specFor(tub),
    animalId: null,
    quantity,
    priceText: '',
    suggestedCents: priceCents,
  });
}

export function addOnLine(item: PriceListItem, quantity: number): DraftLine {
  return draft({
    kind: 'item',
    description: item.label,
    origin: `Add-on, per ${item.unit}`,
    planId: null,
    spec: null,
    animalId: null,
    quantity,
    priceText: centsToInput(unitsToCents(item.price)),
    suggestedCents: null,
  });
}

export function animalLine(animal: ForSaleAnimal, priceCents: number): DraftLine {
  return draft({
    kind: 'item',
    description: describeAnimal(animal),
    origin: `Animal for sale, ${animal.code}`,
    planId: null,
    spec: null,
    animalId: animal.id,
    quantity: 1,
    priceText: centsToInput(priceCents),
    suggestedCents: null,
  });
}

export function plainLine(kind: QuoteLineKind, description: string, quantity: number, priceText: string, suggestedCents: number | null = null): DraftLine {
  const origin = kind === 'delivery' ? 'Delivery' : kind === 'labor' ? 'Labor, in hours' : kind === 'discount' ? 'Discount, subtracted' : 'Item';
  return draft({ kind, description, origin, planId: null, spec: null, animalId: null, quantity, priceText, suggestedCents });
}

/** A saved line back into the editor, keeping the price it was quoted at. */
export function fromQuoteLine(line: QuoteLine): DraftLine {
  return draft({
    kind: line.kind,
    description: line.description,
    origin: line.kind === 'rack' ? (line.planId ? `Saved plan #${line.planId}` : 'Rack from a spec') : line.animalId ? 'Animal for sale' : '',
    planId: line.planId,
    spec: line.planId ? null : line.spec,
    animalId: line.animalId,
    quantity: line.quantity,
    priceText: centsToInput(line.unitPriceCents),
    suggestedCents: line.unitPriceCents,
  });
}

/** The price a line will carry: what was typed, else what the server is expected to use; null if unknown. */
export function effectivePriceCents(line: DraftLine): number | null {
  if (line.priceText.trim()) return parseMoneyToCents(line.priceText);
  return line.suggestedCents;
}

/** Why a line cannot be saved, or null. */
export function lineProblem(line: DraftLine): string | null {
  if (!Number.isInteger(line.quantity) || line.quantity < 1) return 'Quantity must be a whole number, at least 1.';
  if (line.priceText.trim() && parseMoneyToCents(line.priceText) === null) return 'Price must be an amount like 45 or 45.50.';
  if (line.kind !== 'rack' && !line.description.trim()) return 'Describe the line.';
  if (line.kind !== 'rack' && line.kind !== 'delivery' && !line.priceText.trim()) return 'Enter a price.';
  return null;
}

/** The line as POST/PATCH /api/v1/quotes expects it. */
export function toLineInput(line: DraftLine): Record<string, unknown> {
  const body: Record<string, unknown> = { kind: line.kind, quantity: line.quantity };
  if (line.description.trim()) body['description'] = line.description.trim();
  if (line.kind === 'rack') {
    if (line.planId !== null) body['planId'] = line.planId;
    else body['spec'] = line.spec;
  }
  // An animal's line names it, so handing the order over marks it sold in the collection.
  if (line.animalId !== null) body['animalId'] = line.animalId;
  const typed = line.priceText.trim() ? parseMoneyToCents(line.priceText) : null;
  if (typed !== null) body['unitPriceCents'] = typed;
  return body;
}

export function describeAnimal(animal: ForSaleAnimal): string {
  const sex = animal.sex === 'male' ? 'male' : animal.sex === 'female' ? 'female' : 'unsexed';
  const parts = [animal.species, animal.morph].filter((p) => p && p.trim());
  const name = animal.name ? ` “${animal.name}”` : '';
  const hatched = animal.hatchDate ? `, hatched ${animal.hatchDate}` : '';
  return `${parts.join(', ')}, ${sex}, ${animal.code}${name}${hatched}`.slice(0, 300);
}
