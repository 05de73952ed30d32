import type { z } from 'zod';
import type {
  Plan as PlanSchema,
  PlanComparison as PlanComparisonSchema,
  PlanListItem as PlanListItemSchema,
  PutMaterialRequest as PutMaterialRequestSchema,
  PlanVersionListItem as PlanVersionListItemSchema,
  PriceListItem as PriceListItemSchema,
  ShopMaterial as ShopMaterialSchema,
} from '@tubwright/shared/api/plans';
import type { RackPlanRequest, RackPlanResponse } from '@tubwright/shared/api/rack-plan';

// Types only: a value import from shared/api would pull zod into the bundle.
export type { RackPlanRequest, RackPlanResponse };
export type Plan = z.output<typeof PlanSchema>;
export type PlanListItem = z.output<typeof PlanListItemSchema>;
export type PlanVersionListItem = z.output<typeof PlanVersionListItemSchema>;
export type PriceListItem = z.output<typeof PriceListItemSchema>;
export type ShopMaterial = z.output<typeof ShopMaterialSchema>;
export type MaterialInput = z.input<typeof PutMaterialRequestSchema>;
export type PlanComparison = z.output<typeof PlanComparisonSchema>;
export type RackPart = RackPlanResponse['parts'][number];
export type RackCheck = RackPlanResponse['checks'][number];
export type CuttingPlan = NonNullable<RackPlanResponse['cutting']>;
