import { AnimalPhoto, AnimalPhotoList, AnimalProfile, ForSaleList, ImportPreview, ImportResult, UpdateProfileRequest } from '../../../shared/api/collection-animals.js';
import {
  AnimalGenes, Clutch, ClutchListQuery, ClutchPage, CREATE_CLUTCH_EXAMPLE, CREATE_PAIRING_EXAMPLE, CreateClutchRequest, CreateObservationRequest, CreatePairingRequest,
  CreateTraitRequest, HATCH_EXAMPLE, HatchRequest, HatchResponse, Pairing, PairingListQuery, PairingOutcomesView, PairingPage, SetGenesRequest, Trait, TraitListQuery,
  TraitPage, UpdateClutchRequest, UpdatePairingRequest, UpdateTraitRequest,
} from '../../../shared/api/collection-breeding.js';
import {
  CALIBRATION_CAUTION, CREATE_READING_EXAMPLE, CreateReadingRequest, EnvironmentListQuery, EnvironmentReading, EnvironmentReadingPage, RangeSet, ReadingUploadQuery, ReadingUploadResult, SpeciesList,
} from '../../../shared/api/collection-environment.js';
import {
  BULK_FEEDING_EXAMPLE, BulkFeedingRequest, CREATE_EVENT_EXAMPLE, CreateEventRequest, EventBatch, EventExportQuery, EventListQuery, EventPage, HusbandryEvent, WeightSeries,
} from '../../../shared/api/collection-husbandry.js';
import { CREATE_RACK_EXAMPLE, CreateRackRequest, EmptyTubList, EmptyTubsQuery, PlaceAnimalRequest, PlacementHistory, RackListQuery, RackMap, RackPage, UpdateRackRequest } from '../../../shared/api/collection-racks.js';
import { DigestRequest, DigestResponse, DueList, DueQuery } from '../../../shared/api/collection-schedules.js';
import { IdParams } from '../../../shared/api/common.js';
import { documentRoutes } from './route-catalog.js';

// Keepers and the owner run the collection; sales read the for-sale list and the trait names; builders have no access.
const KEEPERS = ['owner', 'keeper'];
const KEEPERS_AND_SALES = ['owner', 'keeper', 'sales'];
const NO_CONTENT = { status: 204, description: 'Done' } as const;
const ANIMAL_CSV_COLUMNS = 'code, name, species, morph, sex, hatchDate, weightG, status, notes, origin, acquiredFrom, forSale, feedingIntervalDays';

documentRoutes(
  // Racks and tubs
  { method: 'get', path: '/api/v1/racks', tag: 'racks', summary: 'List installed racks with tub counts', roles: KEEPERS, query: RackListQuery, success: { status: 200, schema: RackPage, description: 'One page' } },
  { method: 'get', path: '/api/v1/racks/:id', tag: 'racks', summary: 'A rack with the map of its tubs and occupants', roles: KEEPERS, params: IdParams, success: { status: 200, schema: RackMap, description: 'The rack and its tubs' }, errors: [404] },
  {
    method: 'post', path: '/api/v1/racks', tag: 'racks', summary: 'Build a rack: levels x columns labelled tubs', roles: KEEPERS, body: CreateRackRequest, bodyExample: CREATE_RACK_EXAMPLE,
    success: { status: 201, schema: RackMap, description: 'Created with its tubs' }, errors: [409],
    description: 'Tubs are labelled rack-level-column, e.g. `R4-2B` (level 1 is the top shelf, column A the left). A rack built from a saved plan gives its `planId` together with the plan\'s levels and columns. 409 when another rack in use has the same name.',
  },
  { method: 'patch', path: '/api/v1/racks/:id', tag: 'racks', summary: 'Change where a rack stands and its notes', roles: KEEPERS, params: IdParams, body: UpdateRackRequest, success: { status: 200, schema: RackMap, description: 'Changed' }, errors: [404] },
  { method: 'delete', path: '/api/v1/racks/:id', tag: 'racks', summary: 'Remove an empty rack (kept in history)', roles: KEEPERS, params: IdParams, success: NO_CONTENT, errors: [404, 409], description: '409 while any tub of the rack houses an animal.' },
  { method: 'get', path: '/api/v1/tubs/empty', tag: 'racks', summary: 'Empty tubs, by rack', roles: KEEPERS, query: EmptyTubsQuery, success: { status: 200, schema: EmptyTubList, description: 'Empty tubs' }, errors: [404] },
  { method: 'get', path: '/api/v1/animals/:id/placements', tag: 'racks', summary: 'Where an animal has lived', roles: KEEPERS, params: IdParams, success: { status: 200, schema: PlacementHistory, description: 'Current tub and history' }, errors: [404] },
  {
    method: 'put', path: '/api/v1/animals/:id/tub', tag: 'racks', summary: 'Place or move an animal into an empty tub', roles: KEEPERS, params: IdParams, body: PlaceAnimalRequest, bodyExample: { tubId: 12 },
    success: { status: 200, schema: PlacementHistory, description: 'The new placement and history' }, errors: [404, 409, 422],
    description: 'Closes the current placement (kept in the history), opens the new one and sets the animal\'s `location` to the tub label. 409 when the tub is occupied; 422 for a tub that does not exist or an animal that is sold or deceased.',
  },
  { method: 'delete', path: '/api/v1/animals/:id/tub', tag: 'racks', summary: 'Take an animal out of its tub', roles: KEEPERS, params: IdParams, success: NO_CONTENT, errors: [404] },

  // Husbandry
  {
    method: 'post', path: '/api/v1/animals/:id/events', tag: 'husbandry', summary: 'Record a feeding, weight, shed, cleaning, health note or note', roles: KEEPERS, params: IdParams, body: CreateEventRequest, bodyExample: CREATE_EVENT_EXAMPLE,
    success: { status: 201, schema: HusbandryEvent, description: 'Recorded' }, errors: [404],
    description: 'Fields depend on `kind`. 400 names the field for a time in the future (`occurredAt`) or a weight or prey mass of 0 or less. A weight becomes the animal\'s latest `weightG`.',
  },
  { method: 'get', path: '/api/v1/animals/:id/events', tag: 'husbandry', summary: 'An animal\'s events, filtered by kinds', roles: KEEPERS, params: IdParams, query: EventListQuery, success: { status: 200, schema: EventPage, description: 'One page' }, errors: [404] },
  { method: 'get', path: '/api/v1/animals/:id/weights', tag: 'husbandry', summary: 'Weights over time and a prey mass suggestion', roles: KEEPERS, params: IdParams, success: { status: 200, schema: WeightSeries, description: 'Weight series' }, errors: [404] },
  { method: 'delete', path: '/api/v1/events/:id', tag: 'husbandry', summary: 'Undo one event (kept in history)', roles: KEEPERS, params: IdParams, success: NO_CONTENT, errors: [404] },
  {
    method: 'post', path: '/api/v1/racks/:id/feeding', tag: 'husbandry', summary: 'Feeding day: one result per tub of a rack', roles: KEEPERS, params: IdParams, body: BulkFeedingRequest, bodyExample: BULK_FEEDING_EXAMPLE,
    success: { status: 201, schema: EventBatch, description: 'The entry and its events' }, errors: [404, 422],
    description: 'Every result is written in one transaction, or none. 422 names the entry (`entries[2].tubId`) when a tub is empty, not in the rack or listed twice. Undo the whole entry with DELETE /api/v1/event-batches/{id}. Send an `Idempotency-Key` header so a retried request is written once (the same key with another body: 422).',
  },
  { method: 'delete', path: '/api/v1/event-batches/:id', tag: 'husbandry', summary: 'Undo a whole feeding-day entry', roles: KEEPERS, params: IdParams, success: { status: 200, schema: EventBatch, description: 'The entry, now undone' }, errors: [404, 409], description: '409 when it was undone already.' },

  // Schedules
  {
    method: 'get', path: '/api/v1/feeding/due', tag: 'feeding', summary: 'Who is due to eat, grouped by rack', roles: KEEPERS, query: DueQuery, success: { status: 200, schema: DueList, description: 'The due list' },
    description: 'Due = last feeding (any result) plus the animal\'s interval: its own, or the default for its stage (common practice: hatchlings every 5 to 7 days, adults every 10 to 14; the long end is used, juveniles 10). Flags: three or more refusals or regurgitations in a row; the latest weight 10 % or more below the highest of the 60 days before it. Prey suggestion: about 10 % of body mass.',
  },
  {
    method: 'post', path: '/api/v1/feeding/digest', tag: 'feeding', summary: 'E-mail the day\'s due list to the keepers', roles: KEEPERS, body: DigestRequest, bodyExample: {}, success: { status: 200, schema: DigestResponse, description: 'Sent' }, errors: [422],
    description: 'Sent to every active keeper (the owner when there is none) and logged. For the owner, a keeper or a scheduler calling with the gateway\'s identity.',
  },

  // Traits and genes
  { method: 'get', path: '/api/v1/traits', tag: 'genetics', summary: 'The shop\'s trait list', roles: KEEPERS_AND_SALES, query: TraitListQuery, success: { status: 200, schema: TraitPage, description: 'One page' } },
  { method: 'get', path: '/api/v1/traits/:id', tag: 'genetics', summary: 'Read one trait', roles: KEEPERS_AND_SALES, params: IdParams, success: { status: 200, schema: Trait, description: 'The trait' }, errors: [404] },
  { method: 'post', path: '/api/v1/traits', tag: 'genetics', summary: 'Add a trait', roles: KEEPERS, body: CreateTraitRequest, bodyExample: { name: 'lattice', mode: 'recessive', notes: '' }, success: { status: 201, schema: Trait, description: 'Created' }, errors: [409] },
  {
    method: 'patch', path: '/api/v1/traits/:id', tag: 'genetics', summary: 'Rename a trait, or change its mode or notes', roles: KEEPERS, params: IdParams, body: UpdateTraitRequest, bodyExample: { name: 'lattice', mode: 'recessive' },
    success: { status: 200, schema: Trait, description: 'Changed' }, errors: [404, 409],
    description: '409 (field `name`) for a name another trait has, ignoring case; 409 (field `mode`) for a change to or from recessive while animals carry the trait (their het and visual genes would not fit single and super).',
  },
  { method: 'delete', path: '/api/v1/traits/:id', tag: 'genetics', summary: 'Remove a trait no animal carries', roles: KEEPERS, params: IdParams, success: NO_CONTENT, errors: [404, 409] },
  { method: 'get', path: '/api/v1/animals/:id/genes', tag: 'genetics', summary: 'An animal\'s genes', roles: KEEPERS, params: IdParams, success: { status: 200, schema: AnimalGenes, description: 'Genes' }, errors: [404] },
  {
    method: 'put', path: '/api/v1/animals/:id/genes', tag: 'genetics', summary: 'Replace an animal\'s genes', roles: KEEPERS, params: IdParams, body: SetGenesRequest, bodyExample: { genes: [{ traitId: 1, state: 'het' }, { traitId: 3, state: 'possible-het', hetProbability: 0.6667 }] },
    success: { status: 200, schema: AnimalGenes, description: 'Genes' }, errors: [404, 422], description: '422 names the gene whose state does not fit its trait\'s mode.',
  },

  // Pairings and clutches
  { method: 'get', path: '/api/v1/pairings', tag: 'breeding', summary: 'List pairings', roles: KEEPERS, query: PairingListQuery, success: { status: 200, schema: PairingPage, description: 'One page' } },
  { method: 'get', path: '/api/v1/pairings/:id', tag: 'breeding', summary: 'A pairing with its observations and laying window', roles: KEEPERS, params: IdParams, success: { status: 200, schema: Pairing, description: 'The pairing' }, errors: [404] },
  {
    method: 'post', path: '/api/v1/pairings', tag: 'breeding', summary: 'Plan a pairing of a male and a female', roles: KEEPERS, body: CreatePairingRequest, bodyExample: CREATE_PAIRING_EXAMPLE,
    success: { status: 201, schema: Pairing, description: 'Created' }, errors: [422],
    description: 'The laying window (common practice, from memory) is 27 to 33 days after the pre-lay shed, otherwise 44 to 54 days after ovulation. 422 names `sireId` or `damId` when the animal is unknown, of the wrong sex, sold or deceased.',
  },
  { method: 'patch', path: '/api/v1/pairings/:id', tag: 'breeding', summary: 'Change status, dates or notes', roles: KEEPERS, params: IdParams, body: UpdatePairingRequest, success: { status: 200, schema: Pairing, description: 'Changed' }, errors: [404] },
  { method: 'delete', path: '/api/v1/pairings/:id', tag: 'breeding', summary: 'Remove a pairing without clutches (kept in history)', roles: KEEPERS, params: IdParams, success: NO_CONTENT, errors: [404, 409] },
  { method: 'post', path: '/api/v1/pairings/:id/observations', tag: 'breeding', summary: 'Record an introduction, lock or separation', roles: KEEPERS, params: IdParams, body: CreateObservationRequest, bodyExample: { kind: 'lock', observedOn: '2026-11-28', notes: '' }, success: { status: 201, schema: Pairing, description: 'The pairing' }, errors: [404] },
  {
    method: 'get', path: '/api/v1/pairings/:id/outcomes', tag: 'breeding', summary: 'Outcome tables for the pair\'s recorded genes', roles: KEEPERS, params: IdParams, success: { status: 200, schema: PairingOutcomesView, description: 'Outcome tables' }, errors: [404, 422],
    description: 'Computed by POST /api/v1/genetics/pairing-outcomes from both parents\' genes. 422 when neither parent has recorded genes.',
  },
  { method: 'get', path: '/api/v1/clutches', tag: 'breeding', summary: 'List clutches', roles: KEEPERS, query: ClutchListQuery, success: { status: 200, schema: ClutchPage, description: 'One page' } },
  { method: 'get', path: '/api/v1/clutches/:id', tag: 'breeding', summary: 'Read one clutch', roles: KEEPERS, params: IdParams, success: { status: 200, schema: Clutch, description: 'The clutch' }, errors: [404] },
  {
    method: 'post', path: '/api/v1/clutches', tag: 'breeding', summary: 'Record a clutch with its expected hatch', roles: KEEPERS, body: CreateClutchRequest, bodyExample: CREATE_CLUTCH_EXAMPLE, success: { status: 201, schema: Clutch, description: 'Created' }, errors: [422],
    description: 'Expected hatch: 55 to 60 days after laying at 88 to 90 °F (common practice); a warning comes with temperatures outside that range.',
  },
  { method: 'patch', path: '/api/v1/clutches/:id', tag: 'breeding', summary: 'Change egg counts, incubation or notes', roles: KEEPERS, params: IdParams, body: UpdateClutchRequest, success: { status: 200, schema: Clutch, description: 'Changed' }, errors: [404] },
  {
    method: 'post', path: '/api/v1/clutches/:id/hatch', tag: 'breeding', summary: 'Record the hatch: hatchlings become animals with parents and genes', roles: KEEPERS, params: IdParams, body: HatchRequest, bodyExample: HATCH_EXAMPLE,
    success: { status: 201, schema: HatchResponse, description: 'The clutch and its hatchlings' }, errors: [404, 409, 422],
    description: 'Each hatchling\'s genes come from the parents\' outcome tables and what it shows: shown traits as seen, normal-looking recessive traits as het or possible het with the table\'s chance (2/3 for het x het). 422 names the hatchling whose looks these parents cannot produce; 409 when the clutch hatched already or a code is taken.',
  },

  // Environment
  { method: 'get', path: '/api/v1/environment/ranges', tag: 'environment', summary: 'The ranges readings are checked against', roles: KEEPERS, success: { status: 200, schema: RangeSet, description: 'Ranges' }, description: `Common practice: warm side 88 to 92 °F, cool side 76 to 80 °F, humidity 50 to 60 %. ${CALIBRATION_CAUTION}` },
  {
    method: 'get', path: '/api/v1/environment/species', tag: 'environment', summary: 'The species of the collection with their husbandry ranges', roles: KEEPERS, success: { status: 200, schema: SpeciesList, description: 'Species, by name' },
    description: `Every species animals in the collection carry (active or on hold), and the ball python always. Ranges are common practice and given only where the shop has them on record (ball python: warm side 88 to 92 °F, cool side 76 to 80 °F, humidity 50 to 60 %); null otherwise. ${CALIBRATION_CAUTION}`,
  },
  { method: 'get', path: '/api/v1/environment-readings', tag: 'environment', summary: 'Temperature and humidity readings, with alerts', roles: KEEPERS, query: EnvironmentListQuery, success: { status: 200, schema: EnvironmentReadingPage, description: 'One page' } },
  { method: 'post', path: '/api/v1/environment-readings', tag: 'environment', summary: 'Enter a reading', roles: KEEPERS, body: CreateReadingRequest, bodyExample: CREATE_READING_EXAMPLE, success: { status: 201, schema: EnvironmentReading, description: 'Recorded' }, errors: [422] },
  {
    method: 'post', path: '/api/v1/environment-readings/upload', tag: 'environment', summary: 'Upload a data logger\'s CSV for one rack', roles: KEEPERS, query: ReadingUploadQuery,
    success: { status: 201, schema: ReadingUploadResult, description: 'Imported' }, errors: [404, 413],
    description: `Body: the CSV file itself with \`Content-Type: text/csv\` (RFC 4180, header row, up to 2 MB). Columns: takenAt (required; UTC unless an offset is given), tempF or tempC (°C converted exactly, NIST SP 811), humidityPct, probe (warm, cool or ambient; warm when empty). Every row is checked first: with any bad cell, 400 names the first (\`csv[3].tempF\`, the line number) and lists all in \`error.details\`, and nothing is imported. 415 for another content type. ${CALIBRATION_CAUTION}`,
  },

  // Import and export
  {
    method: 'post', path: '/api/v1/collection/animals/import/preview', tag: 'import and export', summary: 'Check an animal CSV without writing anything', roles: KEEPERS, success: { status: 200, schema: ImportPreview, description: 'What the import would do' }, errors: [413],
    description: `Body: the CSV file with \`Content-Type: text/csv\` (RFC 4180, header row, up to 2 MB). Columns: ${ANIMAL_CSV_COLUMNS}; code and species are required. Every bad cell is listed with its line and column. 415 for another content type.`,
  },
  {
    method: 'post', path: '/api/v1/collection/animals/import', tag: 'import and export', summary: 'Import animals from CSV, all or nothing', roles: KEEPERS, success: { status: 201, schema: ImportResult, description: 'Imported' }, errors: [413, 422],
    description: 'Body as for the preview. Writes every row in one transaction; with any bad row nothing is written and 422 names the first (`csv[4].weightG`). 415 for another content type.',
  },
  { method: 'get', path: '/api/v1/collection/animals.csv', tag: 'import and export', summary: 'Export the animals as CSV', roles: KEEPERS, success: { status: 200, description: `A text/csv attachment (RFC 4180) with the import columns: ${ANIMAL_CSV_COLUMNS}.` } },
  { method: 'get', path: '/api/v1/collection/events.csv', tag: 'import and export', summary: 'Export husbandry events as CSV', roles: KEEPERS, query: EventExportQuery, success: { status: 200, description: 'A text/csv attachment (RFC 4180): id, animalCode, kind, occurredAt, preyKind, preySize, preyMassG, result, weightG, shed, note, createdBy; oldest first.' } },

  // Animal profile and sales
  { method: 'get', path: '/api/v1/animals/:id/profile', tag: 'animals', summary: 'An animal with origin, parents, tub, genes and feeding interval', roles: KEEPERS, params: IdParams, success: { status: 200, schema: AnimalProfile, description: 'The profile' }, errors: [404] },
  { method: 'patch', path: '/api/v1/animals/:id/profile', tag: 'animals', summary: 'Set origin, parents, feeding interval or for sale', roles: KEEPERS, params: IdParams, body: UpdateProfileRequest, bodyExample: { origin: 'acquired', acquiredFrom: 'a local breeder', forSale: true }, success: { status: 200, schema: AnimalProfile, description: 'Changed' }, errors: [404, 422] },
  {
    method: 'post', path: '/api/v1/animals/:id/photos', tag: 'animals', summary: 'Upload a photo of an animal', roles: KEEPERS, params: IdParams,
    success: { status: 201, schema: AnimalPhoto, description: 'Stored' }, errors: [404, 413],
    description: 'Body: `multipart/form-data` with one file in the field `photo`: JPEG, PNG, GIF or WebP (checked by its bytes), at most 5 MB. 415 for anything else, 413 when larger; nothing is stored when the upload is refused. No thumbnails are made (no image library is installed); clients scale the original. 503 when the server has no uploads folder configured.',
  },
  { method: 'get', path: '/api/v1/animals/:id/photos', tag: 'animals', summary: 'An animal\'s photos', roles: KEEPERS, params: IdParams, success: { status: 200, schema: AnimalPhotoList, description: 'Photos' }, errors: [404] },
  { method: 'get', path: '/api/v1/animal-photos/:id/file', tag: 'animals', summary: 'The image of a photo', roles: KEEPERS, params: IdParams, success: { status: 200, description: 'The image bytes with their content type.' }, errors: [404] },
  { method: 'delete', path: '/api/v1/animal-photos/:id', tag: 'animals', summary: 'Remove a photo (kept in history)', roles: KEEPERS, params: IdParams, success: NO_CONTENT, errors: [404] },
  { method: 'get', path: '/api/v1/collection/for-sale', tag: 'animals', summary: 'Animals offered for sale, with their genes', roles: KEEPERS_AND_SALES, success: { status: 200, schema: ForSaleList, description: 'For sale' } },
);

