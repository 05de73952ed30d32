import { defineTubwrightElement, provideTubwrightKit } from '@tubwright/kit';
import { CollectionElement } from './app/collection-element';

defineTubwrightElement('tw-collection', CollectionElement, [provideTubwrightKit()]).catch((error: unknown) =>
  console.error('tw-collection could not start', error),
);
