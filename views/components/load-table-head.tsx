// The header of a stage's current table: the rail, then each mode with the unit its boxes read (from the load spec).
import type { FC } from 'hono/jsx';
import { MODES, MODE_LABELS } from '../../src/core/model';
import { loadCurrentFields } from '../../src/core/spec/stage';

export const LoadTableHead: FC = () => (
  <thead>
    <tr>
      <th>Rail</th>
      {MODES.map((m) => (
        <th>
          {MODE_LABELS[m]} ({loadCurrentFields[`currentA.${m}`].display.symbol})
        </th>
      ))}
    </tr>
  </thead>
);
