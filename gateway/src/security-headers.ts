import type { RequestHandler } from 'express';
import helmet from 'helmet';

/**
 * Browser protections for everything the gateway serves. The console loads only its own scripts,
 * fonts and styles (fonts ship with the app, no CDN); Angular writes component styles into <style>
 * tags at run time, hence 'unsafe-inline' for styles only. Images may be data: or blob: URLs
 * (photo previews, drawings). Nobody may frame the console.
 */
export function securityHeaders(): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        baseUri: ["'self'"],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
        frameSrc: ["'self'"],
      },
    },
    // The widget's script is fetched by other sites; its route sets cross-origin itself.
    crossOriginResourcePolicy: { policy: 'same-origin' },
    referrerPolicy: { policy: 'same-origin' },
    strictTransportSecurity: false, // served over plain HTTP on loopback; a TLS proxy in front sets it
  });
}
