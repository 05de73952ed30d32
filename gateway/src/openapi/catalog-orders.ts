import { documentRoutes } from './route-catalog.js';

// Routes of the orders area.
documentRoutes();
