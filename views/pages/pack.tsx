// Builder pack page: the PDF downloads and, on screen, the build and safety checklists it contains.
import type { FC } from 'hono/jsx';
import type { Project } from '../../src/core/model';
import type { ChecklistSection } from '../../src/core/checklists';
import { formatValue } from '../../src/core/units';

const Section: FC<{ section: ChecklistSection }> = ({ section }) => (
  <div class="checklist">
    <h3>{section.title}</h3>
    <ul>
      {section.items.map((i) => (
        <li class={i.emphasis === 'caution' ? 'caution-item' : ''}>
          <span class="tick" aria-hidden="true">
            ☐
          </span>{' '}
          {i.text}
          {i.value !== null ? (
            <span class="source">
              {' '}
              ({formatValue(i.value, i.unit)}
              {i.basis ? `; ${i.basis}` : ''})
            </span>
          ) : null}
        </li>
      ))}
    </ul>
  </div>
);

// [part, title, what its pages are]: the same split as the PDF's (src/pdf/pack.ts)
const PACK_CHOICES: [string, string, (kits: number) => string][] = [
  [
    'builder',
    'Builder’s pack',
    () =>
      'parts for one rig (no prices), current budget, supply design, RF results, build and safety checklists, sources',
  ],
  [
    'organiser',
    'Organiser’s pack',
    (kits) =>
      `costed parts list and totals, order sheets per ` +
        `supplier${kits > 1 ? `, ${kits} packing sheets (one per kit)` : ''}`,
  ],
  ['both', 'Both in one file', () => 'the organiser’s pages, then the builder’s'],
];

export const PackBody: FC<{
  project: Project;
  build: ChecklistSection[];
  safety: ChecklistSection[];
  safetyPreamble: string;
}> = ({ project, build, safety, safetyPreamble }) => (
  <div id="pack">
    <section class="card">
      <h1>Builder and organiser packs (PDF)</h1>
      <p>
        Each pack opens with a cover: the project summary, the key results and the one safety notice. Choose the pages
        for who reads them:
      </p>
      <table class="grid pack-choice">
        <thead>
          <tr>
            <th>Pack</th>
            <th>Pages</th>
            <th>Download</th>
          </tr>
        </thead>
        <tbody>
          {PACK_CHOICES.map(([part, title, pages]) => (
            <tr>
              <th scope="row">{title}</th>
              <td>{pages(project.kits)}</td>
              <td class="actions">
                <a
                  class="button"
                  href={`/projects/${project.id}/pack.pdf?part=${part}&paper=a4`}
                  download
                  aria-label={`${title}, A4`}
                >
                  A4
                </a>{' '}
                <a
                  class="button"
                  href={`/projects/${project.id}/pack.pdf?part=${part}&paper=letter`}
                  download
                  aria-label={`${title}, US Letter`}
                >
                  US Letter
                </a>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <p class="hint">
        The pack is computed from the project as stored now; its pages carry today's date as the date of the data.
      </p>
    </section>
    <div class="columns">
      <section class="card">
        <h2>Build checklist, in build order</h2>
        {build.map((s) => (
          <Section section={s} />
        ))}
      </section>
      <section class="card">
        <h2>Safety checklist</h2>
        <p class="caution-box">{safetyPreamble}</p>
        {/* the preamble is said once, in the box above (the PDF drops the checklist's copy the same way) */}
        {safety.map((s) => (
          <Section section={{ ...s, items: s.items.filter((i) => i.text !== safetyPreamble) }} />
        ))}
      </section>
    </div>
  </div>
);
