"use client";

import { useId, useMemo, useRef } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import type { PublicationView, QuestionDetail, SchoolRef } from "@/lib/questions/desk-types";
import { TOPIC_LABELS } from "@/lib/questions/labels";
import { findPersonalDetails } from "@/lib/questions/personal-details";
import { QUESTION_TOPICS, type QuestionTopic } from "@/lib/questions/state-machine";
import { publishSchema } from "@/lib/validation/desk";
import { deskApi } from "./api";
import { formatDateTime } from "./format";
import { PersonalDetailWarnings } from "./personal-detail-warnings";
import { useQuestionMutation } from "./use-question";

type PublishFormValues = z.output<typeof publishSchema>;
interface PublishFormInput {
  questionText: string;
  school: string;
  topic: string;
}

const CONTROL = "mt-1 block w-full rounded-plate border-2 border-ink-soft bg-white px-3 py-2 text-base text-ink aria-[invalid=true]:border-ember";
const EVERY_SCHOOL = "every";

function FieldError({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} className="mt-1 font-bold text-ember-deep">
      <span aria-hidden="true">! </span>
      {message}
    </p>
  );
}

/** The public version of a sent answer: the question rewritten without personal details, for one school or all. */
export function PublishPanel({ question, schools, timeZone }: { question: QuestionDetail; schools: SchoolRef[]; timeZone: string }) {
  const id = useId();
  const heading = useRef<HTMLHeadingElement>(null);
  const live = question.publications.filter((p) => !p.unpublishedAt);
  const past = question.publications.filter((p) => p.unpublishedAt);
  const initialTopic: string = (QUESTION_TOPICS as readonly string[]).includes(question.topic) ? question.topic : "other";
  const {
    register,
    handleSubmit,
    setError,
    control,
    formState: { errors },
  } = useForm<PublishFormInput>({
    defaultValues: {
      questionText: live[0]?.questionText ?? question.drafts[0]?.publicQuestion ?? "",
      school: live[0] ? (live[0].schoolId === null ? EVERY_SCHOOL : String(live[0].schoolId)) : question.school ? String(question.school.id) : EVERY_SCHOOL,
      topic: live[0]?.topic ?? initialTopic,
    },
    resolver: async (values) => {
      const parsed = publishSchema.safeParse({
        questionText: values.questionText,
        schoolId: values.school === EVERY_SCHOOL ? null : Number(values.school),
        topic: values.topic,
      });
      if (parsed.success) return { values: values, errors: {} };
      const out: Record<string, { type: string; message: string }> = {};
      for (const issue of parsed.error.issues) {
        const key = issue.path[0] === "schoolId" ? "school" : String(issue.path[0]);
        out[key] ??= { type: "validate", message: issue.message };
      }
      return { values: {}, errors: out };
    },
  });
  const text = useWatch({ control, name: "questionText" }) ?? "";
  const warnings = useMemo(() => findPersonalDetails(text, "publicQuestion"), [text]);

  const publish = useQuestionMutation(question.id, (v: PublishFormValues) => deskApi.publish(question.id, v.questionText, v.schoolId, v.topic), {
    success: (q) => {
      const newest = q.publications.find((p) => !p.unpublishedAt);
      const verb = live.length > 0 ? "Public version updated" : "Published on the answers page";
      return newest ? `${verb}: ${newest.url}` : `${verb}.`;
    },
    onFieldErrors: (fields) => {
      for (const [name, message] of Object.entries(fields)) {
        const key = name === "schoolId" ? "school" : name;
        if (key === "questionText" || key === "school" || key === "topic") setError(key, { type: "server", message }, { shouldFocus: true });
      }
    },
  });
  const unpublish = useQuestionMutation(question.id, (p: PublicationView) => deskApi.unpublish(p.id), {
    success: () => "Taken off the answers page. Its link now shows “not found”.",
    // The button is gone with the publication: carry on from the panel's heading.
    onDone: () => window.setTimeout(() => heading.current?.focus(), 0),
  });

  const onSubmit = handleSubmit((values) =>
    !publish.isPending &&
    publish.mutate({
      questionText: values.questionText.trim(),
      schoolId: values.school === EVERY_SCHOOL ? null : Number(values.school),
      topic: values.topic as QuestionTopic,
    }),
  );

  return (
    <section aria-labelledby={`${id}-title`} className="mt-6 rounded-plate border-2 border-paper-line bg-white p-4" data-testid="publish-panel">
      <h2 id={`${id}-title`} ref={heading} tabIndex={-1} className="text-xl focus:outline-none focus-visible:outline-3">
        The answers page
      </h2>
      {live.length > 0 ? (
        <ul className="mt-2 space-y-3">
          {live.map((p) => (
            <li key={p.id} className="rounded-plate border-l-8 border-leaf bg-leaf-soft p-3">
              <p>
                <span aria-hidden="true">✓ </span>
                <strong>Published</strong> {formatDateTime(p.publishedAt, timeZone)}:{" "}
                <a href={p.url} data-testid="publication-link">
                  {p.questionText}
                </a>
              </p>
              <p className="text-sm">
                {p.schoolId === null ? "All schools" : (schools.find((s) => s.id === p.schoolId)?.name ?? "One school")} ·{" "}
                {TOPIC_LABELS[p.topic] ?? p.topic}
              </p>
              <button
                type="button"
                disabled={unpublish.isPending}
                onClick={() => unpublish.mutate(p)}
                className="mt-2 min-h-11 rounded-plate border-2 border-ember bg-paper px-3 font-bold text-ember-deep hover:bg-ember-soft disabled:opacity-60"
              >
                Unpublish<span className="sr-only"> “{p.questionText}”</span>
              </button>
            </li>
          ))}
        </ul>
      ) : null}
      {past.length > 0 ? (
        <p className="mt-2 text-sm text-ink-soft">
          Taken down before: {past.map((p) => `“${p.questionText}” (${formatDateTime(p.unpublishedAt!, timeZone)})`).join("; ")}
        </p>
      ) : null}

      {question.can.publish ? (
        <form onSubmit={onSubmit} noValidate className="mt-3">
          {live.length > 0 ? <h3 className="text-base">Change the public version</h3> : null}
          <p className="max-w-prose">
            {live.length > 0 ? "Publishing again replaces the public question, school and topic, and the answer with its latest version." : "Publish this answer so other families can find it."} Families read the question as you write it here, never the asker&apos;s own words, name
            or e-mail address.
          </p>
          <div className="mt-3">
            <label htmlFor={`${id}-text`} className="block font-bold">
              Question as the public will read it
            </label>
            <p id={`${id}-text-hint`} className="text-sm text-ink-soft">
              Filled in from the draft when it has one. No names, no contact details, nothing about one child&apos;s health.
            </p>
            <textarea
              id={`${id}-text`}
              rows={3}
              aria-invalid={errors.questionText ? true : undefined}
              aria-describedby={[`${id}-text-hint`, errors.questionText ? `${id}-text-error` : null].filter(Boolean).join(" ")}
              className={CONTROL}
              {...register("questionText")}
            />
            <FieldError id={`${id}-text-error`} message={errors.questionText?.message} />
          </div>
          <div className="mt-3">
            <PersonalDetailWarnings warnings={warnings} id={`${id}-warnings`} />
          </div>
          <div className="mt-3 grid gap-3 sm:grid-cols-2">
            <div>
              <label htmlFor={`${id}-school`} className="block font-bold">
                School
              </label>
              <select
                id={`${id}-school`}
                aria-invalid={errors.school ? true : undefined}
                aria-describedby={errors.school ? `${id}-school-error` : undefined}
                className={CONTROL}
                {...register("school")}
              >
                <option value={EVERY_SCHOOL}>Every school</option>
                {schools.map((s) => (
                  <option key={s.id} value={String(s.id)}>
                    {s.name}
                  </option>
                ))}
              </select>
              <FieldError id={`${id}-school-error`} message={errors.school?.message} />
            </div>
            <div>
              <label htmlFor={`${id}-topic`} className="block font-bold">
                Topic
              </label>
              <select
                id={`${id}-topic`}
                aria-invalid={errors.topic ? true : undefined}
                aria-describedby={errors.topic ? `${id}-topic-error` : undefined}
                className={CONTROL}
                {...register("topic")}
              >
                {QUESTION_TOPICS.map((t) => (
                  <option key={t} value={t}>
                    {TOPIC_LABELS[t] ?? t}
                  </option>
                ))}
              </select>
              <FieldError id={`${id}-topic-error`} message={errors.topic?.message} />
            </div>
          </div>
          <button
            type="submit"
            aria-disabled={publish.isPending || undefined}
            className="mt-4 min-h-11 rounded-plate border-2 border-harbour bg-harbour px-4 font-bold text-paper hover:bg-harbour-deep aria-disabled:opacity-60"
          >
            {publish.isPending ? "Publishing…" : live.length > 0 ? "Update the public version" : "Publish on the answers page"}
          </button>
        </form>
      ) : null}
      {!question.can.publish && live.length === 0 ? <p className="mt-2 text-ink-soft">Not published.</p> : null}
    </section>
  );
}
