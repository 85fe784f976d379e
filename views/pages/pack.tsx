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
          {i.value !== null ? <span class="source"> ({formatValue(i.value, i.unit)}{i.basis ? `; ${i.basis}` : ''})</span> : null}
        </li>
      ))}
    </ul>
  </div>
);

export const PackBody: FC<{ project: Project; build: ChecklistSection[]; safety: ChecklistSection[]; safetyPreamble: string }> = ({ project, build, safety, safetyPreamble }) => (
  <div id="pack">
    <section class="card">
      <h1>Builder pack (PDF)</h1>
      <p>
        One PDF for each builder: a cover with the project summary, the costed parts list, {project.kits > 1 ? `${project.kits} packing sheets (one per kit), ` : ''}the current
        budget, the supply design, the RF results, and the build and safety checklists below.
      </p>
      <p class="row">
        <a class="button" href={`/projects/${project.id}/pack.pdf?paper=a4`} download>
          Download PDF (A4)
        </a>
        <a class="button" href={`/projects/${project.id}/pack.pdf?paper=letter`} download>
          Download PDF (US Letter)
        </a>
      </p>
      <p class="hint">The pack is computed from the project as stored now; its pages carry today's date as the date of the data.</p>
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
        {safety.map((s) => (
          <Section section={s} />
        ))}
      </section>
    </div>
  </div>
);
