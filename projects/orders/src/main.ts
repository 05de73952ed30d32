import { defineTubwrightElement, provideTubwrightKit } from '@tubwright/kit';
import { OrdersElement } from './app/orders-element';

defineTubwrightElement('tw-orders', OrdersElement, [provideTubwrightKit()]).catch((error: unknown) =>
  console.error('tw-orders could not start', error),
);
