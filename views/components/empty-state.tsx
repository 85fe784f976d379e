// What to do next on a page that has nothing yet: one short paragraph with the next step and where to take it.
import type { Child, FC } from 'hono/jsx';

export const EmptyState: FC<{ children?: Child; label: string }> = ({ children, label }) => (
  <p class="empty-state" role="note" aria-label={label}>
    <strong>Next: </strong>
    {children}
  </p>
);
