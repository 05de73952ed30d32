import type { Knex } from 'knex';
import { PRICE_KEYS, PRICE_KEY_LIST, SHEET_MATERIAL_IDS, type PriceKey } from '../../../../shared/api/rack-plan.js';
import { nowIso } from '../db/knex.js';

type PriceCategory = 'sheet' | 'lumber' | 'hardware' | 'heat' | 'labor' | 'margin' | 'other';

export interface PriceRow {
  key: string;
  label: string;
  unit: string;
  price: number;
  category: PriceCategory;
  notes: string;
  created_at: string;
  updated_at: string;
}

export interface MaterialRow {
  id: number;
  key: string;
  label: string;
  kind: 'sheet' | 'board';
  thickness_in: number;
  density_kg_m3: number;
  modulus_mpa: number;
  heated_modulus_mpa: number | null;
  source: string;
  price_per_sheet: number;
  sheet_length_in: number;
  sheet_width_in: number;
  created_at: string;
  updated_at: string;
}

const CALCULATOR_PRICE_KEYS = new Set<string>(PRICE_KEY_LIST);
const LUMBER_KEY = 'lumber-2x4';
const CALCULATOR_MATERIAL_KEYS = new Set<string>([...SHEET_MATERIAL_IDS, LUMBER_KEY]);

export const isCalculatorPriceKey = (key: string): key is PriceKey => CALCULATOR_PRICE_KEYS.has(key);
export const isCalculatorMaterialKey = (key: string) => CALCULATOR_MATERIAL_KEYS.has(key);

/** The price-list key a material's price lives under; lumber is priced per foot, a sheet per sheet. */
function priceKeyOfMaterial(materialKey: string): { key: PriceKey; perFoot: boolean } | null {
  if (materialKey === LUMBER_KEY) return { key: 'lumber.2x4-per-foot', perFoot: true };
  const key = `sheet.${materialKey}`;
  return isCalculatorPriceKey(key) ? { key, perFoot: false } : null;
}

function materialKeyOfPrice(priceKey: string): { key: string; perFoot: boolean } | null {
  if (priceKey === 'lumber.2x4-per-foot') return { key: LUMBER_KEY, perFoot: true };
  if (priceKey.startsWith('sheet.') && isCalculatorPriceKey(priceKey)) return { key: priceKey.slice('sheet.'.length), perFoot: false };
  return null;
}

const money = (x: number) => Math.round(x * 10_000) / 10_000;

/** Unit and category of a calculator key, so the owner need only give a price. */
export function calculatorPriceMeta(key: PriceKey): { label: string; unit: string; category: PriceCategory } {
  const label = PRICE_KEYS[key];
  if (key.startsWith('sheet.')) return { label, unit: 'sheet', category: 'sheet' };
  if (key.startsWith('lumber.')) return { label, unit: 'ft', category: 'lumber' };
  if (key === 'heat-tape.per-foot') return { label, unit: 'ft', category: 'heat' };
  if (key === 'thermostat') return { label, unit: 'each', category: 'heat' };
  if (key === 'labor.rate-per-hour') return { label, unit: 'hour', category: 'labor' };
  if (key.startsWith('labor.')) return { label, unit: 'minutes', category: 'labor' };
  if (key === 'margin-percent') return { label, unit: 'percent', category: 'margin' };
  if (key === 'pvc-cement') return { label, unit: 'can', category: 'hardware' };
  return { label, unit: 'each', category: 'hardware' };
}

export function toPriceItem(row: PriceRow) {
  return {
    key: row.key,
    label: row.label,
    unit: row.unit,
    price: row.price,
    category: row.category,
    notes: row.notes,
    usedByCalculator: isCalculatorPriceKey(row.key),
    updatedAt: row.updated_at,
  };
}

export function toMaterialItem(row: MaterialRow) {
  return {
    id: row.id,
    key: row.key,
    label: row.label,
    kind: row.kind,
    thicknessIn: row.thickness_in,
    densityKgM3: row.density_kg_m3,
    modulusMPa: row.modulus_mpa,
    heatedModulusMPa: row.heated_modulus_mpa,
    source: row.source,
    pricePerSheet: row.price_per_sheet,
    sheetLengthIn: row.sheet_length_in,
    sheetWidthIn: row.sheet_width_in,
    usedByCalculator: isCalculatorMaterialKey(row.key),
    updatedAt: row.updated_at,
  };
}

export interface PriceEntryInput {
  key: string;
  price: number | null;
  label?: string;
  unit?: string;
  category?: PriceCategory;
  notes?: string;
}

export interface MaterialInput {
  label: string;
  kind: 'sheet' | 'board';
  thicknessIn: number;
  densityKgM3: number;
  modulusMPa: number;
  heatedModulusMPa: number | null;
  source: string;
  pricePerSheet: number;
  sheetLengthIn: number;
  sheetWidthIn: number;
}

/** Missing label for a new key the calculator does not describe; the caller names the field. */
export class MissingLabelError extends Error {
  constructor(readonly index: number) {
    super('label is required for a new key');
  }
}

/** The shop's price list and materials. A material's price and its price-list entry are kept equal. */
export function priceListStore(db: Knex) {
  const listPrices = async (q: Knex = db) => (await q<PriceRow>('price_list').orderBy([{ column: 'category' }, { column: 'key' }])).map(toPriceItem);
  const listMaterials = async (q: Knex = db) => (await q<MaterialRow>('materials').orderBy([{ column: 'kind', order: 'desc' }, { column: 'key' }])).map(toMaterialItem);

  async function writePrice(trx: Knex, entry: { key: string; price: number; label?: string; unit?: string; category?: PriceCategory; notes?: string }, now: string) {
    const existing = await trx<PriceRow>('price_list').where({ key: entry.key }).first();
    if (existing) {
      await trx('price_list')
        .where({ key: entry.key })
        .update({
          price: entry.price,
          ...(entry.label !== undefined && { label: entry.label }),
          ...(entry.unit !== undefined && { unit: entry.unit }),
          ...(entry.category !== undefined && { category: entry.category }),
          ...(entry.notes !== undefined && { notes: entry.notes }),
          updated_at: now,
        });
      return;
    }
    const meta = isCalculatorPriceKey(entry.key) ? calculatorPriceMeta(entry.key) : { label: entry.label!, unit: 'each', category: 'other' as const };
    await trx('price_list').insert({
      key: entry.key,
      label: entry.label ?? meta.label,
      unit: entry.unit ?? meta.unit,
      category: entry.category ?? meta.category,
      notes: entry.notes ?? '',
      price: entry.price,
      created_at: now,
      updated_at: now,
    });
  }

  return {
    listPrices,
    listMaterials,

    /** Calculator prices the shop has set; the calculator's defaults fill the rest. */
    async shopPrices(): Promise<Partial<Record<PriceKey, number>>> {
      const rows = await db<PriceRow>('price_list').whereIn('key', PRICE_KEY_LIST).select('key', 'price');
      return Object.fromEntries(rows.map((r) => [r.key, r.price]));
    },

    /** Upsert by key (see UpdatePriceListRequest); throws MissingLabelError before writing anything. */
    async upsertPrices(entries: PriceEntryInput[]) {
      const existingKeys = new Set((await db<PriceRow>('price_list').whereIn('key', entries.map((e) => e.key)).select('key')).map((r) => r.key));
      entries.forEach((e, i) => {
        if (e.price !== null && !existingKeys.has(e.key) && !isCalculatorPriceKey(e.key) && !e.label) throw new MissingLabelError(i);
      });
      const now = nowIso();
      await db.transaction(async (trx) => {
        for (const entry of entries) {
          if (entry.price === null) {
            await trx('price_list').where({ key: entry.key }).delete();
            continue;
          }
          await writePrice(trx, { ...entry, price: entry.price }, now);
          const material = materialKeyOfPrice(entry.key);
          if (material) {
            const row = await trx<MaterialRow>('materials').where({ key: material.key }).first();
            if (row) {
              const perSheet = material.perFoot ? entry.price * (row.sheet_length_in / 12) : entry.price;
              await trx('materials').where({ key: material.key }).update({ price_per_sheet: money(perSheet), updated_at: now });
            }
          }
        }
      });
      return listPrices();
    },

    async putMaterial(key: string, input: MaterialInput): Promise<{ created: boolean; item: ReturnType<typeof toMaterialItem> }> {
      const now = nowIso();
      const row = {
        label: input.label,
        kind: input.kind,
        thickness_in: input.thicknessIn,
        density_kg_m3: input.densityKgM3,
        modulus_mpa: input.modulusMPa,
        heated_modulus_mpa: input.heatedModulusMPa,
        source: input.source,
        price_per_sheet: input.pricePerSheet,
        sheet_length_in: input.sheetLengthIn,
        sheet_width_in: input.sheetWidthIn,
        updated_at: now,
      };
      const created = await db.transaction(async (trx) => {
        const existing = await trx<MaterialRow>('materials').where({ key }).first();
        if (existing) await trx('materials').where({ key }).update(row);
        else await trx('materials').insert({ key, ...row, created_at: now });
        const price = priceKeyOfMaterial(key);
        if (price) {
          const value = price.perFoot ? input.pricePerSheet / (input.sheetLengthIn / 12) : input.pricePerSheet;
          await writePrice(trx, { key: price.key, price: money(value) }, now);
        }
        return !existing;
      });
      const saved = await db<MaterialRow>('materials').where({ key }).first();
      return { created, item: toMaterialItem(saved!) };
    },
  };
}
