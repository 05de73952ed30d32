import Stripe from 'stripe';
import { ApiError } from '../../../common/src/errors.js';

/** The provider's errors become ours: a declined card is the customer's problem (422), anything else is the provider's (502). */
export function providerError(err: unknown): ApiError {
  if (err instanceof Stripe.errors.StripeCardError) return new ApiError(422, 'card_declined', err.message || 'The card was declined.', 'paymentMethod');
  if (err instanceof Stripe.errors.StripeError) return new ApiError(502, 'payments_unavailable', `The payment provider refused or did not answer: ${err.message}`);
  return new ApiError(502, 'payments_unavailable', 'The payment provider did not answer; try again in a moment.');
}
