"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { TextField } from "@/components/ui/field";
import { FormProblems, problemsOf } from "@/components/ui/form-problems";
import { SubmitButton } from "@/components/ui/submit-button";
import { TOO_MANY_ATTEMPTS } from "@/lib/auth/throttle";
import { signInSchema, type SignInInput } from "@/lib/validation/sign-in";

const FIELDS = [
  { name: "email", id: "email", label: "E-mail" },
  { name: "password", id: "password", label: "Password" },
];

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const [failure, setFailure] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useForm<SignInInput>({ resolver: zodResolver(signInSchema), defaultValues: { email: "", password: "" } });

  async function onSubmit(values: SignInInput) {
    setFailure(null);
    const result = await signIn("credentials", { ...values, redirect: false, callbackUrl });
    if (!result || result.error) {
      setFailure(
        result?.error === TOO_MANY_ATTEMPTS
          ? "Too many failed attempts for this account. Wait 15 minutes, then try again, or ask an administrator."
          : "That e-mail and password do not match an active staff account.",
      );
      return;
    }
    window.location.assign(callbackUrl);
  }

  return (
    <form onSubmit={handleSubmit(onSubmit, () => setFailure(null))} noValidate aria-describedby={failure ? "sign-in-failure" : undefined}>
      <FormProblems id="sign-in-problems" title="Not signed in" problems={problemsOf(FIELDS, errors)} />
      <div role="alert" id="sign-in-failure" className={failure ? "mb-5 rounded-plate border-l-8 border-ember bg-ember-soft p-3 font-bold" : "sr-only"}>
        {failure}
      </div>
      <TextField id="email" label="E-mail" type="email" autoComplete="username" error={errors.email?.message} {...register("email")} />
      <TextField id="password" label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...register("password")} />
      <SubmitButton busy={isSubmitting} busyLabel="Signing in…" className="w-full">
        Sign in
      </SubmitButton>
    </form>
  );
}
