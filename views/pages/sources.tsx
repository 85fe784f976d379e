// Sources page: every source this project's checks rest on, with the checks it backs. Text only from the registry.
import type { FC } from 'hono/jsx';
import type { SourceUse } from '../../src/core/sources/used';
import { STATUS_WORDS } from '../../src/core/sources/used';
import { GOVERNS, RULE_SETS, type RuleSet } from '../../src/core/rules/rule-set';

export const SourcesBody: FC<{ ruleSet: RuleSet; uses: SourceUse[] }> = ({ ruleSet, uses }) => (
  <section class="card" id="sources">
    <h2>Sources</h2>
    <p>
      Rule set: <strong>{RULE_SETS[ruleSet].label}</strong>. {GOVERNS}
    </p>
    <p class="hint">Each source as you would look it up, and the checks of this project that rest on it.</p>
    <ul class="sources">
      {uses.map((u) => (
        <li data-source={u.key} data-status={u.status}>
          <span class="sub">{STATUS_WORDS[u.status]}:</span> {u.text}
          <ul class="checks">
            {u.checks.map((c) => (
              <li>{c}</li>
            ))}
          </ul>
        </li>
      ))}
    </ul>
  </section>
);
