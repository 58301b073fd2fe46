"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { createAccountAction } from "@/app/(staff)/staff/users/actions";
import { SelectField, TextField } from "@/components/ui/field";
import { FormProblems, problemsOf } from "@/components/ui/form-problems";
import { SubmitButton } from "@/components/ui/submit-button";
import { ROLES } from "@/db/types";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { newStaffAccountSchema, type NewStaffAccount, type NewStaffAccountInput } from "@/lib/validation/staff-account";

const FIELDS = [
  { name: "name", id: "new-name", label: "Name" },
  { name: "email", id: "new-email", label: "E-mail" },
  { name: "role", id: "new-role", label: "Role" },
  { name: "password", id: "new-password", label: "First password" },
];

export function NewAccountForm() {
  const [status, setStatus] = useState<{ ok: boolean; message: string } | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<NewStaffAccountInput, unknown, NewStaffAccount>({
    resolver: zodResolver(newStaffAccountSchema),
    defaultValues: { name: "", email: "", role: "communications", password: "" },
  });

  async function onSubmit(values: NewStaffAccount) {
    const result = await createAccountAction(values);
    setStatus({ ok: result.ok, message: result.message });
    for (const [field, message] of Object.entries(result.errors ?? {})) {
      if (field in values) setError(field as keyof NewStaffAccountInput, { message });
    }
    if (result.ok) reset();
  }

  return (
    <form onSubmit={handleSubmit(onSubmit, () => setStatus(null))} noValidate className="max-w-md">
      <FormProblems id="new-account-problems" title="Not added" problems={problemsOf(FIELDS, errors)} />
      <TextField id="new-name" label="Name" autoComplete="off" error={errors.name?.message} {...register("name")} />
      <TextField id="new-email" label="E-mail" type="email" autoComplete="off" error={errors.email?.message} {...register("email")} />
      <SelectField
        id="new-role"
        label="Role"
        options={ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))}
        error={errors.role?.message}
        {...register("role")}
      />
      <TextField
        id="new-password"
        label="First password"
        type="password"
        autoComplete="new-password"
        hint="At least 12 characters. Tell it to the person directly, never by e-mail."
        error={errors.password?.message}
        {...register("password")}
      />
      <SubmitButton busy={isSubmitting} busyLabel="Adding…">
        Add staff member
      </SubmitButton>
      <p role="status" aria-live="polite" className={status ? `mt-3 font-bold ${status.ok ? "text-leaf" : "text-ember-deep"}` : "sr-only"}>
        {status?.message}
      </p>
    </form>
  );
}
