import helmet from 'helmet';

/**
 * A strict Content-Security-Policy: everything from our own origin. Styles allow inline because
 * PrimeVue's styled mode injects its theme as <style> elements at run time.
 */
export function securityHeaders(githubAuthorizeUrl?: string) {
  const formAction = ["'self'"];
  if (githubAuthorizeUrl) formAction.push(new URL(githubAuthorizeUrl).origin);
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
        frameAncestors: ["'none'"],
        baseUri: ["'self'"],
        formAction,
      },
    },
    crossOriginEmbedderPolicy: false,
  });
}
