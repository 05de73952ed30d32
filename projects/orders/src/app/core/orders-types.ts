import type { z } from 'zod';
import type { ForSaleAnimal as ForSaleAnimalSchema } from '@tubwright/shared/api/collection-animals';
import type { CuttingPlanRequestInput, CuttingPlanResponse } from '@tubwright/shared/api/cutting-plan';
import type {
  Invoice as InvoiceSchema,
  InvoiceDetail as InvoiceDetailSchema,
  MailLogEntry as MailLogEntrySchema,
  Order as OrderSchema,
  OrderRack as OrderRackSchema,
  OrderSettings,
  OrderStage as OrderStageSchema,
  OrderStatus,
  OrderSummary as OrderSummarySchema,
  Payment as PaymentSchema,
  Quote as QuoteSchema,
  QuoteLine as QuoteLineSchema,
  QuoteSummary as QuoteSummarySchema,
  Refund as RefundSchema,
} from '@tubwright/shared/api/orders';
import type { Plan as PlanSchema, PlanListItem as PlanListItemSchema, PriceListItem as PriceListItemSchema } from '@tubwright/shared/api/plans';
import type { RackPlanRequestInput, RackPlanResponse } from '@tubwright/shared/api/rack-plan';
import type { StockItem as StockItemSchema, StockReservation as StockReservationSchema } from '@tubwright/shared/api/stock';

// Types only: importing the schemas' values would put zod into the bundle.
export type { CuttingPlanRequestInput, CuttingPlanResponse, OrderSettings, OrderStatus, RackPlanRequestInput, RackPlanResponse };
export type QuoteSummary = z.output<typeof QuoteSummarySchema>;
export type Quote = z.output<typeof QuoteSchema>;
export type QuoteLine = z.output<typeof QuoteLineSchema>;
export type QuoteStatus = QuoteSummary['status'];
export type QuoteLineKind = QuoteLine['kind'];
export type OrderSummary = z.output<typeof OrderSummarySchema>;
export type Order = z.output<typeof OrderSchema>;
export type OrderRack = z.output<typeof OrderRackSchema>;
export type OrderStage = z.output<typeof OrderStageSchema>;
export type Payment = z.output<typeof PaymentSchema>;
export type Refund = z.output<typeof RefundSchema>;
export type StockItem = z.output<typeof StockItemSchema>;
export type StockKind = StockItem['kind'];
export type StockReservation = z.output<typeof StockReservationSchema>;
export type Invoice = z.output<typeof InvoiceSchema>;
export type InvoiceDetail = z.output<typeof InvoiceDetailSchema>;
export type MailLogEntry = z.output<typeof MailLogEntrySchema>;
export type PlanListItem = z.output<typeof PlanListItemSchema>;
export type Plan = z.output<typeof PlanSchema>;
export type PriceListItem = z.output<typeof PriceListItemSchema>;
export type ForSaleAnimal = z.output<typeof ForSaleAnimalSchema>;
export type RackCheckItem = RackPlanResponse['checks'][number];
