import { defineTubwrightElement, provideTubwrightKit } from '@tubwright/kit';
import { PlanningElement } from './app/planning-element';

defineTubwrightElement('tw-planning', PlanningElement, [provideTubwrightKit()]).catch((error: unknown) =>
  console.error('tw-planning could not start', error),
);
