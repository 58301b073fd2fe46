"use client";

import { startTransition, useActionState, type BaseSyntheticEvent, useEffect, useRef, useState, useSyncExternalStore } from "react";
import { useForm, useWatch, type Resolver } from "react-hook-form";
import { askAction, type AskFormState } from "@/app/(public)/ask/actions";
import { CheckboxField, SelectField, TextAreaField, TextField } from "@/components/ui/field";
import { TOPIC_LABELS } from "@/lib/questions/labels";
import { REPLY_LANGUAGES } from "@/lib/questions/languages";
import { QUESTION_TOPICS } from "@/lib/questions/state-machine";
import type { AskFormInput, AskFormValues } from "@/lib/validation/question";
import { DISTRICT_WIDE, NAME_MAX_LENGTH, QUESTION_MAX_LENGTH, ROOM_MAX_LENGTH } from "@/lib/validation/question-limits";
import { AnswerSuggestions } from "./answer-suggestions";

export interface AskFormProps {
  schools: { slug: string; name: string }[];
  /** From the link that brought the parent here, e.g. /ask?school=eastmere&topic=air. */
  initialSchool?: string;
  initialTopic?: string;
}

type FieldName = keyof AskFormInput;

/** Summary order is page order. */
const FIELDS: { name: FieldName; id: string }[] = [
  { name: "school", id: "ask-school" },
  { name: "topic", id: "ask-topic" },
  { name: "room", id: "ask-room" },
  { name: "question", id: "ask-question" },
  { name: "name", id: "ask-name" },
  { name: "email", id: "ask-email" },
  { name: "language", id: "ask-language" },
  { name: "consent", id: "ask-consent" },
  { name: "website", id: "ask-website" },
];

const HONEYPOT_MESSAGE = "This looked like an automated message, so it was not sent. If you are a person, reload the page and send it again.";

const INITIAL_STATE: AskFormState = { status: "idle" };

const subscribeNothing = () => () => undefined;

type AskResolver = Resolver<AskFormInput, unknown, AskFormValues>;
let schemaResolver: Promise<AskResolver> | undefined;

/**
 * The shared zod schema (the same one the server action checks) is most of this form's code, so it
 * is fetched when the form is first focused rather than with the page. If it cannot be fetched, the
 * form is sent unchecked and the server's checks answer instead.
 */
function loadSchemaResolver(): Promise<AskResolver> {
  if (!schemaResolver) {
    schemaResolver = Promise.all([import("@hookform/resolvers/zod"), import("@/lib/validation/question")]).then(
      ([{ zodResolver }, { askFormSchema }]) => zodResolver(askFormSchema),
    );
    // A failed download is tried again on the next focus or check.
    schemaResolver.catch(() => {
      schemaResolver = undefined;
    });
  }
  return schemaResolver;
}

const askResolver: AskResolver = async (values, context, options) => {
  let resolver: AskResolver;
  try {
    resolver = await loadSchemaResolver();
  } catch {
    return { values: values as AskFormValues, errors: {} };
  }
  return resolver(values, context, options);
};

function text(value: string | boolean | undefined, fallback = ""): string {
  return typeof value === "string" ? value : fallback;
}

export function AskForm({ schools, initialSchool, initialTopic }: AskFormProps) {
  const [state, formAction, pending] = useActionState(askAction, INITIAL_STATE);
  const summaryRef = useRef<HTMLDivElement>(null);
  const [focusRequest, setFocusRequest] = useState(0);
  // False while the server's HTML is hydrated, true after: without JavaScript the server's errors are all there is.
  const hydrated = useSyncExternalStore(subscribeNothing, () => true, () => false);

  const v = state.values ?? {};
  const initial = {
    school: text(v.school, initialSchool ?? ""),
    topic: text(v.topic, initialTopic ?? ""),
    room: text(v.room),
    question: text(v.question),
    name: text(v.name),
    email: text(v.email),
    language: text(v.language, "en"),
    consent: v.consent === true,
  };

  const {
    register,
    handleSubmit,
    setError,
    control,
    formState: { errors },
  } = useForm<AskFormInput, unknown, AskFormValues>({
    resolver: askResolver,
    defaultValues: { ...initial, website: "" },
    shouldFocusError: false,
  });
  const question = useWatch({ control, name: "question" }) ?? "";
  const school = useWatch({ control, name: "school" }) ?? "";

  useEffect(() => {
    for (const [name, message] of Object.entries(state.errors ?? {})) {
      if (FIELDS.some((f) => f.name === name)) setError(name as FieldName, { type: "server", message });
    }
    if (state.status !== "idle") summaryRef.current?.focus();
  }, [state, setError]);

  useEffect(() => {
    if (focusRequest > 0) summaryRef.current?.focus();
  }, [focusRequest]);

  const errorOf = (name: FieldName): string | undefined => {
    const message = errors[name]?.message ?? (hydrated ? undefined : state.errors?.[name]);
    return name === "website" && message ? HONEYPOT_MESSAGE : message;
  };
  const problems = FIELDS.flatMap((f) => {
    const message = errorOf(f.name);
    return message ? [{ ...f, message }] : [];
  });
  const formProblem = state.errors?._form;
  const notice = state.status === "limited" || state.status === "failed" ? state.message : undefined;
  const showSummary = problems.length > 0 || Boolean(notice) || Boolean(formProblem);

  // Sent as form data, exactly as without JavaScript; calling the action directly also keeps React from clearing the form.
  const onValid = (_values: AskFormValues, event?: BaseSyntheticEvent) => {
    const form = event?.target;
    if (!(form instanceof HTMLFormElement)) return;
    const data = new FormData(form);
    startTransition(() => formAction(data));
  };

  return (
    <form
      action={formAction}
      onSubmit={handleSubmit(onValid, () => setFocusRequest((n) => n + 1))}
      onFocus={() => void loadSchemaResolver().catch(() => undefined)}
      noValidate
      aria-describedby="ask-required-note"
      className="relative"
    >
      <div
        ref={summaryRef}
        id="ask-summary"
        tabIndex={-1}
        role="alert"
        aria-labelledby={showSummary ? "ask-summary-title" : undefined}
        className={showSummary ? "mb-6 rounded-plate border-2 border-ember bg-ember-soft p-4 focus:outline-none focus-visible:outline-3" : ""}
      >
        {showSummary ? (
          <>
            <h2 id="ask-summary-title" className="text-xl text-ember-deep">
              {notice ? "Not sent yet" : problems.length === 1 ? "Not sent yet: one thing to fix" : `Not sent yet: ${problems.length} things to fix`}
            </h2>
            {notice ? <p className="mt-1">{notice}</p> : null}
            {formProblem ? <p className="mt-1">{formProblem}</p> : null}
            {problems.length > 0 ? (
              <ul className="mt-2 list-disc space-y-1 pl-6">
                {problems.map((p) => (
                  <li key={p.name}>
                    {p.name === "website" ? (
                      p.message
                    ) : (
                      <a href={`#${p.id}`} className="font-bold text-ember-deep">
                        {p.message}
                      </a>
                    )}
                  </li>
                ))}
              </ul>
            ) : null}
          </>
        ) : null}
      </div>

      <p id="ask-required-note" className="mb-5 text-sm text-ink-soft">
        Fields marked (optional) can be left empty. Everything else is needed to reply to you.
      </p>

      <fieldset className="mb-2">
        <legend className="mb-3 text-xl font-bold text-harbour-deep">Your question</legend>
        <SelectField
          id="ask-school"
          label="School"
          hint="Pick your child's school, or all schools if it is about the whole district."
          error={errorOf("school")}
          defaultValue={initial.school}
          options={[
            { value: "", label: "Choose a school…" },
            { value: DISTRICT_WIDE, label: "All schools (the whole district)" },
            ...schools.map((s) => ({ value: s.slug, label: s.name })),
          ]}
          {...register("school")}
        />
        <SelectField
          id="ask-topic"
          label="Topic"
          error={errorOf("topic")}
          defaultValue={initial.topic}
          options={[{ value: "", label: "Choose a topic…" }, ...QUESTION_TOPICS.map((t) => ({ value: t, label: TOPIC_LABELS[t] ?? t }))]}
          {...register("topic")}
        />
        <TextField
          id="ask-room"
          label="Room or grade (optional)"
          hint="For example Room 104, or grade 3."
          maxLength={ROOM_MAX_LENGTH}
          autoComplete="off"
          error={errorOf("room")}
          defaultValue={initial.room}
          {...register("room")}
        />
        <TextAreaField
          id="ask-question"
          label="Your question"
          hint="Between 10 and 2,000 characters. Please leave out your child's name and health details: we do not need them to answer."
          rows={6}
          maxLength={QUESTION_MAX_LENGTH}
          error={errorOf("question")}
          defaultValue={initial.question}
          note={`${question.length.toLocaleString("en-US")} of ${QUESTION_MAX_LENGTH.toLocaleString("en-US")} characters`}
          {...register("question")}
        />
        <AnswerSuggestions question={question} school={school} />
      </fieldset>

      <fieldset className="mt-6 mb-2">
        <legend className="mb-3 text-xl font-bold text-harbour-deep">How we reply</legend>
        <TextField
          id="ask-name"
          label="Your name (optional)"
          hint="So we know how to greet you."
          autoComplete="name"
          maxLength={NAME_MAX_LENGTH}
          error={errorOf("name")}
          defaultValue={initial.name}
          {...register("name")}
        />
        <TextField
          id="ask-email"
          label="Your e-mail address"
          hint="We send the answer here, with a private link to follow your question. It is never shown on the website."
          type="email"
          inputMode="email"
          autoComplete="email"
          spellCheck={false}
          error={errorOf("email")}
          defaultValue={initial.email}
          {...register("email")}
        />
        <SelectField
          id="ask-language"
          label="Language for our reply"
          error={errorOf("language")}
          defaultValue={initial.language}
          options={REPLY_LANGUAGES.map((l) => ({ value: l.tag, label: l.label, lang: l.tag }))}
          {...register("language")}
        />
      </fieldset>

      <CheckboxField
        id="ask-consent"
        label="I agree that the district keeps my question and e-mail address to answer me, and shows my question to staff who help answer it."
        error={errorOf("consent")}
        defaultChecked={initial.consent}
        {...register("consent")}
      />

      {/* A trap for scripts that fill in every field; hidden from people and from assistive technology. */}
      <div aria-hidden="true" className="absolute -left-[10000px] top-0 h-px w-px overflow-hidden">
        <label htmlFor="ask-website">Leave this field empty</label>
        <input id="ask-website" type="text" tabIndex={-1} autoComplete="off" defaultValue="" {...register("website")} />
      </div>

      <button
        type="submit"
        disabled={pending}
        className="min-h-12 rounded-plate border-2 border-harbour bg-harbour px-6 text-lg font-bold text-paper hover:bg-harbour-deep disabled:opacity-60"
      >
        {pending ? "Sending your question…" : "Send my question"}
      </button>
      <p aria-live="polite" className="sr-only">
        {pending ? "Sending your question." : ""}
      </p>
    </form>
  );
}
