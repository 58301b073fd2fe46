export interface FormProblem {
  /** The field's id, so the summary can link to it. */
  id: string;
  /** The field's name as people see it; its message stays beside the field and is read with it. */
  label: string;
}

export interface FormProblemsProps {
  /** Stays in the page, empty, so screen readers already know the region when words appear in it. */
  id: string;
  problems: FormProblem[];
  /** Said first, e.g. "Not signed in". */
  title: string;
}

/**
 * After a failed submit: how many fields need a change and which, linked to them, in an alert
 * region that is always present, so its words are announced as they appear; focus goes to the
 * first field that needs a change, whose message is read with it (aria-describedby).
 */
export function FormProblems({ id, problems, title }: FormProblemsProps) {
  const count = problems.length === 1 ? "one thing to fix" : `${problems.length} things to fix`;
  return (
    <div id={id} role="alert" className={problems.length ? "mb-5 rounded-plate border-2 border-ember bg-ember-soft p-4" : "sr-only"}>
      {problems.length ? (
        <>
          <p className="font-bold text-ember-deep">
            {title}: {count}
          </p>
          <ul className="mt-1 list-disc pl-6">
            {problems.map((p) => (
              <li key={p.id}>
                <a href={`#${p.id}`} className="font-bold text-ember-deep">
                  {p.label}
                </a>
              </li>
            ))}
          </ul>
        </>
      ) : null}
    </div>
  );
}

/** The fields react-hook-form found wrong, in the order of the form. */
export function problemsOf(order: { name: string; id: string; label: string }[], errors: Partial<Record<string, { message?: string } | undefined>>): FormProblem[] {
  return order.flatMap(({ name, id, label }) => (errors[name]?.message ? [{ id, label }] : []));
}
