import { z } from 'zod';
import { PastDateTime } from './collection-husbandry.js';
import { IsoDateTime, listQuery, page } from './common.js';

/*
 * Installed racks and their tubs. Levels count from the top shelf (1) down, columns from the left
 * (1); a tub's label is the rack name, the level and the column as a letter, e.g. "R2-3B".
 */

export const MAX_RACK_LEVELS = 30;
export const MAX_RACK_COLUMNS = 12;

export const Rack = z.object({
  id: z.number().int(),
  name: z.string().describe('Short name used in tub labels, e.g. "R2".'),
  levels: z.number().int().describe('Shelves, counted from the top (1).'),
  columns: z.number().int().describe('Tubs side by side on each shelf, counted from the left (1).'),
  planId: z.number().int().nullable().describe('The saved plan the rack was built from, if any.'),
  location: z.string().describe('Where the rack stands, e.g. "snake room, north wall".'),
  notes: z.string(),
  tubCount: z.number().int(),
  occupiedCount: z.number().int().describe('Tubs with an animal in them now.'),
  createdAt: IsoDateTime,
});
export type Rack = z.infer<typeof Rack>;
export const RackPage = page(Rack);
export const RackListQuery = listQuery(['name', 'levels', 'columns', 'location', 'createdAt']);

export const CreateRackRequest = z
  .object({
    name: z
      .string()
      .trim()
      .min(1, 'is required')
      .max(20)
      .regex(/^[A-Za-z0-9][A-Za-z0-9 _.-]*$/, 'uses letters, digits, spaces, dots, dashes and underscores')
      .describe('Short name used in tub labels, unique among the racks in use.'),
    levels: z.number().int().min(1).max(MAX_RACK_LEVELS).describe(`Shelves, 1 to ${MAX_RACK_LEVELS}.`),
    columns: z.number().int().min(1).max(MAX_RACK_COLUMNS).describe(`Tubs per shelf, 1 to ${MAX_RACK_COLUMNS}.`),
    planId: z.number().int().positive().nullable().default(null).describe('The saved plan this rack was built from; its levels and columns are given here as well.'),
    location: z.string().trim().max(80).default(''),
    notes: z.string().max(4000).default(''),
  })
  .strict()
  .describe('A rack with levels x columns tubs; every tub is created with its label.');
export const CREATE_RACK_EXAMPLE = { name: 'R4', levels: 6, columns: 2, planId: null, location: 'snake room, east wall', notes: '' };

export const UpdateRackRequest = z
  .object({
    location: z.string().trim().max(80).optional(),
    notes: z.string().max(4000).optional(),
  })
  .strict()
  .describe('Where the rack stands and notes; its size is fixed once built.');

export const TubOccupant = z
  .object({
    animalId: z.number().int(),
    code: z.string(),
    name: z.string(),
    species: z.string(),
    since: IsoDateTime.describe('When the animal was placed in this tub.'),
  })
  .describe('The animal in a tub now.');

export const Tub = z.object({
  id: z.number().int(),
  rackId: z.number().int(),
  rackName: z.string(),
  level: z.number().int(),
  column: z.number().int(),
  label: z.string().describe('e.g. "R2-3B": rack R2, level 3 from the top, second column.'),
  occupant: TubOccupant.nullable(),
});
export type Tub = z.infer<typeof Tub>;

export const RackMap = Rack.extend({
  tubs: z.array(Tub).describe('Every tub of the rack, top level first, left to right.'),
}).describe('A rack with the map of its tubs and their occupants.');

export const EmptyTubsQuery = z
  .object({ rackId: z.coerce.number().int().positive().optional().describe('Only this rack.') })
  .strict();
export const EmptyTubList = z.object({ items: z.array(Tub), total: z.number().int() }).describe('Empty tubs, by rack, top level first.');

export const PlaceAnimalRequest = z
  .object({
    tubId: z.number().int().positive().describe('The empty tub to move the animal into.'),
    at: PastDateTime.optional().describe('When the move happened; now if left out. Not in the future.'),
  })
  .strict()
  .describe('Places an animal in a tub, or moves it there; the previous placement is closed and kept.');

export const Placement = z.object({
  id: z.number().int(),
  animalId: z.number().int(),
  tubId: z.number().int(),
  label: z.string(),
  placedAt: IsoDateTime,
  removedAt: IsoDateTime.nullable().describe('Null while the animal is still in this tub.'),
});
export const PlacementHistory = z
  .object({ current: Placement.nullable(), items: z.array(Placement).describe('Newest first.') })
  .describe('Where an animal has lived.');
