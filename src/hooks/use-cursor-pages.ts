import { useState } from "react";

/**
 * Where a server-paged list is: the cursors of the pages before this one, so "Previous" goes
 * back without the server paging backwards. Any change of `resetKey` (search, filter, sort)
 * starts again from the first page, since a cursor belongs to one order.
 */
export interface CursorPages {
  /** The cursor of the page shown (undefined on the first). */
  cursor: string | undefined;
  /** 1 on the first page. */
  pageNumber: number;
  next: (cursor: string) => void;
  previous: () => void;
}

/**
 * `resetKey`: the list's search, filters and sort, e.g. JSON.stringify([search, sort, dir]).
 * Pair it with PageControls (src/components/ui/data-table/page-controls.tsx).
 */
export function useCursorPages(resetKey: string): CursorPages {
  const [state, setState] = useState<{ key: string; stack: (string | undefined)[] }>({
    key: resetKey,
    stack: [undefined],
  });
  // Reset during render (not in an effect) so the first page is asked for at once, not after a stale one.
  const current = state.key === resetKey ? state : { key: resetKey, stack: [undefined] };
  if (current !== state) setState(current);
  return {
    cursor: current.stack.at(-1),
    pageNumber: current.stack.length,
    next: (cursor: string) => setState({ key: resetKey, stack: [...current.stack, cursor] }),
    previous: () =>
      setState({ key: resetKey, stack: current.stack.length > 1 ? current.stack.slice(0, -1) : current.stack }),
  };
}
