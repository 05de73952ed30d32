import { defineTubwrightElement } from '@tubwright/kit';
import { RackSizer } from './app/rack-sizer';

// The public widget talks to no API yet, so it needs no HttpClient.
defineTubwrightElement('tw-rack-sizer', RackSizer).catch((error: unknown) => console.error('tw-rack-sizer could not start', error));
