import type { NextFunction, Request, RequestHandler, Response } from 'express'
import helmet from 'helmet'

/**
 * Helmet with a policy that fits the built client: scripts, fonts and styles
 * come from our own origin only. PrimeVue writes its theme into <style> tags
 * at run time, so inline styles are allowed; inline scripts never are.
 */
export function securityHeaders(): RequestHandler[] {
  return [
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          fontSrc: ["'self'", 'data:'],
          imgSrc: ["'self'", 'data:', 'blob:'],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          frameAncestors: ["'none'"],
        },
      },
      referrerPolicy: { policy: 'same-origin' },
      // Only over HTTPS: HSTS sent over plain HTTP would lock a LAN install out of its own address.
      strictTransportSecurity: false,
    }),
    strictTransportOverHttps,
  ]
}

function strictTransportOverHttps(req: Request, res: Response, next: NextFunction) {
  if (req.secure) res.setHeader('Strict-Transport-Security', 'max-age=31536000; includeSubDomains')
  next()
}
