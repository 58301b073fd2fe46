export interface ActionStatusProps {
  status: { ok: boolean; message: string } | null;
  id?: string;
}

/** The result of an action, announced politely; a refusal is marked in words, not only by colour. */
export function ActionStatus({ status, id }: ActionStatusProps) {
  return (
    // With an id it can take focus, for when the control that was used has gone from the page.
    <p id={id} tabIndex={id ? -1 : undefined} role="status" aria-live="polite" className={status ? `mt-3 font-bold ${status.ok ? "text-leaf" : "text-ember-deep"}` : "sr-only"}>
      {status && !status.ok ? <span aria-hidden="true">! </span> : null}
      {status?.message}
    </p>
  );
}
