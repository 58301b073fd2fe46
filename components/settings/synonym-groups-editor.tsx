"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useRef, useState } from "react";
import { useForm } from "react-hook-form";
import {
  addSynonymGroupAction,
  removeSynonymGroupAction,
  resetSynonymsAction,
  updateSynonymGroupAction,
  type SettingsActionResult,
} from "@/app/(staff)/staff/settings/actions";
import { Button, buttonClasses } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import type { SynonymGroup } from "@/lib/settings/synonyms";
import { synonymGroupAddSchema, type SynonymGroupAddInput } from "@/lib/validation/synonyms";
import { ActionStatus } from "./action-status";

type Status = { ok: boolean; message: string } | null;

export interface SynonymGroupsEditorProps {
  groups: SynonymGroup[];
  defaultGroupCount: number;
}

export function SynonymGroupsEditor({ groups, defaultGroupCount }: SynonymGroupsEditorProps) {
  const [status, setStatus] = useState<Status>(null);
  const [editing, setEditing] = useState<string | null>(null);
  const [confirmReset, setConfirmReset] = useState(false);
  const [busy, setBusy] = useState(false);
  const resetButton = useRef<HTMLButtonElement>(null);

  async function run(action: () => Promise<SettingsActionResult>) {
    setBusy(true);
    try {
      const result = await action();
      setStatus(result);
      return result;
    } finally {
      setBusy(false);
    }
  }

  return (
    <div>
      <ActionStatus status={status} id="synonym-status" />
      {groups.length === 0 ? (
        <p className="mt-3">No groups: a search finds only the words typed.</p>
      ) : (
        <ul className="mt-3 divide-y divide-paper-line rounded-plate border-2 border-paper-line bg-white" data-testid="synonym-groups">
          {groups.map((group, index) => {
            const key = group.join("|");
            const changeId = `synonym-change-${index}`;
            return (
              <li key={key} className="p-3" data-group={group.join(", ")}>
                {editing === key ? (
                  <SynonymGroupEdit
                    group={group}
                    onDone={(result) => {
                      if (result) setStatus(result);
                      if (!result || result.ok) {
                        setEditing(null);
                        requestAnimationFrame(() => document.getElementById(result ? "synonym-status" : changeId)?.focus());
                      }
                    }}
                  />
                ) : (
                  <div className="flex flex-wrap items-center justify-between gap-3">
                    <ul className="flex flex-wrap gap-2" aria-label={`Group: ${group.join(", ")}`}>
                      {group.map((word) => (
                        <li key={word} className="rounded-plate border border-harbour-line bg-harbour-soft px-2 py-1 text-harbour-deep">
                          {word}
                        </li>
                      ))}
                    </ul>
                    <div className="flex gap-2">
                      <Button id={changeId} variant="secondary" disabled={busy} onClick={() => setEditing(key)}>
                        Change<span className="sr-only"> the group {group.join(", ")}</span>
                      </Button>
                      <Button variant="danger" disabled={busy} onClick={async () => {
                          await run(() => removeSynonymGroupAction({ original: group }));
                          document.getElementById("synonym-status")?.focus();
                        }}
                      >
                        Remove<span className="sr-only"> the group {group.join(", ")}</span>
                      </Button>
                    </div>
                  </div>
                )}
              </li>
            );
          })}
        </ul>
      )}

      <SynonymGroupAdd onResult={setStatus} />

      <div className="mt-6">
        {confirmReset ? (
          <div role="group" aria-labelledby="reset-question" className="rounded-plate border-2 border-ember bg-ember-soft p-4">
            <p id="reset-question" className="font-bold">
              Replace all {groups.length} groups with the {defaultGroupCount} Clearhall starts with? Groups you added are lost.
            </p>
            <div className="mt-3 flex flex-wrap gap-2">
              <Button
                variant="danger"
                disabled={busy}
                autoFocus
                onClick={async () => {
                  await run(() => resetSynonymsAction());
                  setConfirmReset(false);
                  setEditing(null);
                }}
              >
                Yes, put back the starting list
              </Button>
              <Button
                variant="secondary"
                onClick={() => {
                  setConfirmReset(false);
                  requestAnimationFrame(() => resetButton.current?.focus());
                }}
              >
                Keep this list
              </Button>
            </div>
          </div>
        ) : (
          <button type="button" ref={resetButton} className={buttonClasses("secondary")} onClick={() => setConfirmReset(true)}>
            Put back the starting list…
          </button>
        )}
      </div>
    </div>
  );
}

function SynonymGroupAdd({ onResult }: { onResult: (status: Status) => void }) {
  const {
    register,
    handleSubmit,
    getValues,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<SynonymGroupAddInput, unknown, unknown>({ resolver: zodResolver(synonymGroupAddSchema), defaultValues: { words: "" } });

  async function onSubmit() {
    const result = await addSynonymGroupAction(getValues());
    onResult(result);
    if (result.errors?.words) setError("words", { message: result.errors.words }, { shouldFocus: true });
    else if (!result.ok) setError("words", { message: result.message }, { shouldFocus: true });
    if (result.ok) reset();
  }

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate aria-label="Add a group" className="mt-6 max-w-2xl">
      <TextField
        id="synonym-new"
        label="New group: words that mean the same, separated by commas"
        hint="For example: bus, school bus, transportation. At least two words; a phrase counts as one word."
        autoComplete="off"
        error={errors.words?.message}
        {...register("words")}
      />
      <SubmitButton busy={isSubmitting} busyLabel="Adding…">
        Add the group
      </SubmitButton>
    </form>
  );
}

function SynonymGroupEdit({ group, onDone }: { group: SynonymGroup; onDone: (result: SettingsActionResult | null) => void }) {
  const id = `synonym-edit-${group.join("-").replace(/[^a-z0-9-]/g, "_")}`;
  const {
    register,
    handleSubmit,
    getValues,
    setError,
    setFocus,
    formState: { errors, isSubmitting },
  } = useForm<SynonymGroupAddInput, unknown, unknown>({ resolver: zodResolver(synonymGroupAddSchema), defaultValues: { words: group.join(", ") } });

  useEffect(() => setFocus("words"), [setFocus]);

  async function onSubmit() {
    const result = await updateSynonymGroupAction({ original: group, words: getValues().words });
    if (!result.ok) setError("words", { message: result.errors?.words ?? result.message }, { shouldFocus: true });
    onDone(result);
  }

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate aria-label={`Change the group ${group.join(", ")}`}>
      <TextField
        id={id}
        label="Words in this group, separated by commas"
        autoComplete="off"
        error={errors.words?.message}
        {...register("words")}
      />
      <div className="flex flex-wrap gap-2">
        <SubmitButton busy={isSubmitting} busyLabel="Saving…">
          Save the group
        </SubmitButton>
        <Button variant="secondary" onClick={() => onDone(null)}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
