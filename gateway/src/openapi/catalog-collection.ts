import { documentRoutes } from './route-catalog.js';

// Routes of the collection area.
documentRoutes();
