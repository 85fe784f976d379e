// Small readers for server-rendered HTML in tests: forms, their fields and the version they carry.
// Regex-based on purpose: the markup comes from our own components, whose shape the tests pin down.

export function unescapeHtml(s: string): string {
  return s
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&amp;/g, '&');
}

const attr = (tag: string, name: string): string | undefined => {
  const m = new RegExp(`\\s${name}="([^"]*)"`).exec(tag);
  return m ? unescapeHtml(m[1]) : undefined;
};

/** Every <form> with its action, method and the name/value of its inputs, textareas and selects. */
export interface HtmlForm {
  action: string;
  method: string;
  fields: Record<string, string>;
  /** input type per field name: text, hidden, checkbox, number, ..., 'textarea' or 'select' */
  types: Record<string, string>;
}

export function forms(html: string): HtmlForm[] {
  const out: HtmlForm[] = [];
  for (const m of html.matchAll(/<form\b([^>]*)>([\s\S]*?)<\/form>/g)) {
    const fields: Record<string, string> = {};
    const types: Record<string, string> = {};
    for (const i of m[2].matchAll(/<input\b[^>]*>/g)) {
      const name = attr(i[0], 'name');
      const type = attr(i[0], 'type') ?? 'text';
      if (!name || type === 'file' || type === 'submit') continue;
      types[name] = type;
      if (type === 'checkbox' && !/\schecked/.test(i[0])) continue;
      fields[name] = attr(i[0], 'value') ?? '';
    }
    for (const t of m[2].matchAll(/<textarea\b([^>]*)>([\s\S]*?)<\/textarea>/g)) {
      const name = attr(t[1], 'name');
      if (name) fields[name] = unescapeHtml(t[2]);
      if (name) types[name] = 'textarea';
    }
    for (const s of m[2].matchAll(/<select\b([^>]*)>([\s\S]*?)<\/select>/g)) {
      const name = attr(s[1], 'name');
      if (!name) continue;
      const opts = [...s[2].matchAll(/<option\b([^>]*)>/g)];
      const chosen = opts.find((o) => /\sselected/.test(o[1])) ?? opts[0];
      if (chosen) fields[name] = attr(chosen[1], 'value') ?? '';
      types[name] = 'select';
    }
    out.push({
      action: attr(m[1], 'action') ?? '',
      method: (attr(m[1], 'method') ?? 'get').toLowerCase(),
      fields,
      types,
    });
  }
  return out;
}

/** The form whose action is exactly `action` (throws with the actions seen when missing). */
export function formByAction(html: string, action: string) {
  const all = forms(html);
  const f = all.find((x) => x.action === action);
  if (!f) throw new Error(`no form with action ${action}; forms: ${all.map((x) => x.action).join(', ')}`);
  return f;
}

/** Stage ids in page order, from the overview's <li id="stage-..."> items. */
export function stageIds(html: string): string[] {
  return [...html.matchAll(/<li class="stage" id="stage-([^"]+)"/g)].map((m) => m[1]);
}

export function formBody(fields: Record<string, string>): URLSearchParams {
  return new URLSearchParams(fields);
}
