// The status line after a save and the refusal of a delete, shown at the top of a page body.
import type { FC } from 'hono/jsx';
import type { Failed } from './failed';

export const PageMessages: FC<{ notice?: string; failed?: Failed }> = ({ notice, failed }) => {
  const deleteError = failed?.form.startsWith('delete-') ? failed.state.errors._form : undefined;
  return (
    <>
      {notice ? (
        <p class="notice" role="status">
          {notice}
        </p>
      ) : null}
      {deleteError ? (
        <div class="form-errors" role="alert">
          <p>{deleteError}</p>
        </div>
      ) : null}
    </>
  );
};
