// buildApp(deps): middleware and one router per resource. No side effects at import time.
import { Hono } from 'hono';
import { csrf } from 'hono/csrf';
import { secureHeaders } from 'hono/secure-headers';
import { bodyLimit } from 'hono/body-limit';
import { basicAuth } from 'hono/basic-auth';
import { HTTPException } from 'hono/http-exception';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Deps } from './web/deps';
import { projectRoutes } from './web/routes/projects';
import { overviewRoutes } from './web/routes/overview';
import { supplyRoutes } from './web/routes/supply';
import { stageRoutes } from './web/routes/stage';
import { rfRoutes } from './web/routes/rf';
import { coreRoutes } from './web/routes/cores';
import { packRoutes } from './web/routes/pack';
import { netlistRoutes } from './web/routes/netlists';
import { sourcesRoutes } from './web/routes/sources';
import { partsRoutes } from './web/routes/parts';
import { bomRoutes } from './web/routes/bom';
import { compareRoutes } from './web/routes/compare';
import { sendPage } from './web/render';
import { isBusyError } from './db/client';
import { pageCache } from './web/cache/pages';
import { Layout } from '../views/layout';

const here = dirname(fileURLToPath(import.meta.url));
const require = createRequire(import.meta.url);
const HTMX = readFileSync(resolve(dirname(require.resolve('htmx.org/package.json')), 'dist/htmx.min.js'));
const CSS = readFileSync(resolve(here, '../views/assets/style.css'));

export const BODY_LIMIT_BYTES = 6 * 1024 * 1024;

export function buildApp(deps: Deps) {
  const app = new Hono();
  app.use(
    '*',
    secureHeaders({
      contentSecurityPolicy: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", 'data:'],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
      },
    }),
  );
  if (deps.accessSecret) {
    const secret = deps.accessSecret;
    app.use('*', basicAuth({ verifyUser: (_user, password) => password === secret, realm: 'Rigwright' }));
  }
  app.use('*', csrf());
  app.use(
    '*',
    bodyLimit({
      maxSize: BODY_LIMIT_BYTES,
      onError: (c) => c.text(`Request refused: the body is larger than ${BODY_LIMIT_BYTES / 1024 / 1024} MiB.`, 413),
    }),
  );
  app.get('/assets/htmx.min.js', (c) =>
    c.body(HTMX, 200, { 'Content-Type': 'text/javascript; charset=utf-8', 'Cache-Control': 'max-age=3600' }),
  );
  app.get('/assets/style.css', (c) =>
    c.body(CSS, 200, { 'Content-Type': 'text/css; charset=utf-8', 'Cache-Control': 'max-age=300' }),
  );
  app.get('/healthz', (c) => c.text('ok'));
  app.get('/favicon.ico', (c) => c.body(null, 204));

  // ETags (304) and the per-version page cache for every GET of one project's pages and downloads
  const pages = pageCache(deps);
  app.use('/projects/:id', pages.middleware);
  app.use('/projects/:id/*', pages.middleware);

  app.route('/', projectRoutes(deps));
  app.route('/', overviewRoutes(deps));
  app.route('/', stageRoutes(deps));
  app.route('/', supplyRoutes(deps));
  app.route('/', rfRoutes(deps));
  app.route('/', coreRoutes(deps));
  app.route('/', packRoutes(deps));
  app.route('/', netlistRoutes(deps));
  app.route('/', sourcesRoutes(deps));
  app.route('/', partsRoutes(deps));
  app.route('/', bomRoutes(deps));
  app.route('/', compareRoutes(deps));

  app.notFound((c) =>
    sendPage(
      c,
      <Layout title="Not found">
        <section class="card">
          <h1>Not found</h1>
          <p>
            There is no page at <code>{c.req.path}</code>. It may have been deleted.{' '}
            <a href="/">Back to the projects</a>.
          </p>
        </section>
      </Layout>,
      404,
    ),
  );
  app.onError((err, c) => {
    // Middleware refusals (401 without credentials, 403 cross-site post) carry their own response.
    if (err instanceof HTTPException) {
      if (err.status === 403)
        return c.text(
          'Refused: this request did not come from a Rigwright page (cross-site request protection). Nothing was ' +
            'changed.',
          403,
        );
      return err.getResponse();
    }
    // Another app process kept the database locked through every retry: nothing was written.
    if (isBusyError(err)) {
      const msg = 'The database is busy; nothing was saved. Try again.';
      if (c.req.header('HX-Request') === 'true')
        return c.html(`<div class="form-errors" role="alert"><p>${msg}</p></div>`, 503);
      return sendPage(
        c,
        <Layout title="Busy">
          <section class="card">
            <h1>Busy</h1>
            <p>{msg}</p>
          </section>
        </Layout>,
        503,
      );
    }
    console.error(err);
    return sendPage(
      c,
      <Layout title="Error">
        <section class="card">
          <h1>Something went wrong</h1>
          <p>The request could not be completed and nothing was changed by it. The error was logged on the server.</p>
          <p>
            <a href="/">Back to the projects</a>
          </p>
        </section>
      </Layout>,
      500,
    );
  });
  return app;
}
