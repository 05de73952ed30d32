import type { z } from 'zod';
import type * as animals from '@tubwright/shared/api/collection-animals';
import type * as breeding from '@tubwright/shared/api/collection-breeding';
import type * as environment from '@tubwright/shared/api/collection-environment';
import type * as genetics from '@tubwright/shared/api/genetics';
import type * as plans from '@tubwright/shared/api/plans';
import type * as husbandry from '@tubwright/shared/api/collection-husbandry';
import type * as racks from '@tubwright/shared/api/collection-racks';
import type * as schedules from '@tubwright/shared/api/collection-schedules';

/*
 * Response and request shapes of the records API, inferred from the shared zod schemas.
 * Type-only imports: zod itself stays out of the element bundle.
 */

export type AnimalProfile = z.infer<typeof animals.AnimalProfile>;
export type AnimalPhoto = z.infer<typeof animals.AnimalPhoto>;
export type AnimalPhotoList = z.infer<typeof animals.AnimalPhotoList>;
export type AnimalOrigin = AnimalProfile['origin'];
export type UpdateProfileRequest = z.input<typeof animals.UpdateProfileRequest>;
export type ImportPreview = z.infer<typeof animals.ImportPreview>;
export type ImportResult = z.infer<typeof animals.ImportResult>;

export type Rack = z.infer<typeof racks.Rack>;
export type RackMap = z.infer<typeof racks.RackMap>;
export type Tub = z.infer<typeof racks.Tub>;
export type EmptyTubList = z.infer<typeof racks.EmptyTubList>;
export type PlacementHistory = z.infer<typeof racks.PlacementHistory>;
export type Placement = z.infer<typeof racks.Placement>;

export type HusbandryEvent = z.infer<typeof husbandry.HusbandryEvent>;
export type EventKind = husbandry.EventKind;
export type FeedingResult = husbandry.FeedingResult;
export type PreySize = (typeof husbandry.PREY_SIZES)[number];
export type ShedQuality = NonNullable<HusbandryEvent['shed']>;
export type EventPage = z.infer<typeof husbandry.EventPage>;
export type WeightSeries = z.infer<typeof husbandry.WeightSeries>;
export type EventBatch = z.infer<typeof husbandry.EventBatch>;
export type CreateEventRequest = z.input<typeof husbandry.CreateEventRequest>;
export type BulkFeedingRequest = z.input<typeof husbandry.BulkFeedingRequest>;

export type DueList = z.infer<typeof schedules.DueList>;
export type DueAnimal = z.infer<typeof schedules.DueAnimal>;
export type DigestResponse = z.infer<typeof schedules.DigestResponse>;

export type Trait = z.infer<typeof breeding.Trait>;
export type AnimalGene = z.infer<typeof breeding.AnimalGene>;
export type Pairing = z.infer<typeof breeding.Pairing>;
export type PairingStatus = Pairing['status'];
export type ObservationKind = z.infer<typeof breeding.PairingObservation>['kind'];
export type Clutch = z.infer<typeof breeding.Clutch>;
export type PairingOutcomesView = z.infer<typeof breeding.PairingOutcomesView>;
export type PairingOutcomes = z.infer<typeof genetics.PairingOutcomesResponse>;
export type AppearanceOutcome = z.infer<typeof genetics.AppearanceOutcome>;
export type LooksState = genetics.LooksState;
export type InheritanceMode = genetics.InheritanceMode;
export type HatchRequest = z.input<typeof breeding.HatchRequest>;
export type HatchResponse = z.infer<typeof breeding.HatchResponse>;

export type EnvironmentReading = z.infer<typeof environment.EnvironmentReading>;
export type EnvironmentReadingPage = z.infer<typeof environment.EnvironmentReadingPage>;
export type RangeSet = z.infer<typeof environment.RangeSet>;
export type Probe = EnvironmentReading['probe'];
export type Species = z.infer<typeof environment.Species>;
export type SpeciesList = z.infer<typeof environment.SpeciesList>;

/** What the rack form reads of a saved plan (GET /plans, owner, builder and sales). */
export type PlanListItem = z.infer<typeof plans.PlanListItem>;

/** `{ items, total }` lists that are not paged. */
export interface ItemList<T> {
  items: T[];
  total: number;
}
