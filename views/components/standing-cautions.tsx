// Standing cautions: true of every station of this kind (a design change does not clear them), shown once each in
// their own block so they never bury the findings a builder can act on, and are never hidden.
import type { FC } from 'hono/jsx';
import type { Finding } from '../../src/core/findings';
import { sourceText } from '../../src/core/sources/registry';

export const StandingCautions: FC<{ findings: Finding[]; title?: string }> = ({ findings, title }) =>
  findings.length ? (
    <div class="standing-cautions">
      <h3>{title ?? 'Standing cautions'}</h3>
      <p class="hint">True of every station of this kind; not counted in the verdict.</p>
      <ul class="findings">
        {findings.map((f) => (
          <li data-rule={f.rule} data-kind="standing">
            <strong>{f.subject}</strong>: {f.message} <span class="source">(Source: {sourceText(f.source)})</span>
          </li>
        ))}
      </ul>
    </div>
  ) : null;
