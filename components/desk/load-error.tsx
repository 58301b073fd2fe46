/** A desk list that could not be fetched: the reason, announced, and a way to ask again. */
export function LoadError({ message, onRetry }: { message: string; onRetry: () => void }) {
  return (
    <div role="alert" className="mt-2 rounded-plate border-l-8 border-ember bg-ember-soft p-3">
      <p className="font-bold">{message}</p>
      <button type="button" className="mt-1 min-h-11 font-bold text-harbour underline underline-offset-4" onClick={onRetry}>
        Try again
      </button>
    </div>
  );
}
