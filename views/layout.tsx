// Page frame: the same for every page; project pages get the section tabs.
import type { Child, FC } from 'hono/jsx';

export type Section = 'overview' | 'supply' | 'rf' | 'parts' | 'bom' | 'pack' | 'sources';

const TABS: [Section, string, string][] = [
  ['overview', 'Stages & budget', ''],
  ['supply', 'Supply', '/supply'],
  ['rf', 'RF checks', '/rf'],
  ['parts', 'Parts catalog', '/parts'],
  ['bom', 'Parts list & cost', '/bom'],
  ['pack', 'Builder pack', '/pack'],
  ['sources', 'Sources', '/sources'],
];

/** The project name in the header; an htmx partial that can rename the project sends it again out of band. */
export const ProjectCrumb: FC<{ name: string; oob?: boolean }> = ({ name, oob }) => (
  <span class="crumb" id="project-crumb" hx-swap-oob={oob ? 'true' : undefined}>
    {name}
  </span>
);

export const Layout: FC<{
  title: string;
  project?: { id: string; name: string };
  section?: Section;
  children?: Child;
}> = ({ title, project, section, children }) => (
  <html lang="en">
    <head>
      <meta charset="utf-8" />
      <meta name="viewport" content="width=device-width, initial-scale=1" />
      <title>{title} · Rigwright</title>
      <link rel="stylesheet" href="/assets/style.css" />
      <script src="/assets/htmx.min.js" defer></script>
    </head>
    <body>
      <header class="top">
        <a class="brand" href="/">
          Rigwright
        </a>
        <span class="tagline">station build planner</span>
        {project ? <ProjectCrumb name={project.name} /> : null}
      </header>
      {project ? (
        <nav class="tabs" aria-label="Project sections">
          {TABS.map(([key, label, path]) => (
            <a
              href={`/projects/${project.id}${path}`}
              class={key === section ? 'tab active' : 'tab'}
              aria-current={key === section ? 'page' : undefined}
            >
              {label}
            </a>
          ))}
        </nav>
      ) : null}
      <main>{children}</main>
      <footer class="safety-foot">
        Mains voltages, stored charge, hot heatsinks and RF can injure or kill. These figures are planning aids: follow
        your local electrical code, your licence conditions and licensed practice, and measure before you trust.
      </footer>
    </body>
  </html>
);
