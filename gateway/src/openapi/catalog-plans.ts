import { documentRoutes } from './route-catalog.js';

// Routes of the plans area.
documentRoutes();
