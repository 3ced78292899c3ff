// helmet with a Content-Security-Policy for the built web app served from the same origin:
// scripts, styles and fonts from our own origin only, images also as data: URLs, no inline
// scripts. Inline *styles* are allowed because chart and calendar libraries set them at run time.
import type { RequestHandler } from 'express';
import helmet from 'helmet';

/**
 * API answers carry customers' data and money: no browser or proxy may keep them (ASVS 8.2.1).
 * A route that may be cached says so itself (it overrides this header).
 */
export const apiNoStore: RequestHandler = (_req, res, next) => {
  res.setHeader('Cache-Control', 'no-store');
  next();
};

/** `isHttps`: send HSTS only when the site is served over https. */
export function createSecurityHeaders(isHttps: boolean) {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        baseUri: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        fontSrc: ["'self'", 'data:'],
        imgSrc: ["'self'", 'data:', 'blob:'],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        frameAncestors: ["'none'"],
        formAction: ["'self'"],
        scriptSrcAttr: ["'none'"],
      },
    },
    crossOriginEmbedderPolicy: false,
    strictTransportSecurity: isHttps,
  });
}
