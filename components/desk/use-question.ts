"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { QuestionDetail } from "@/lib/questions/desk-types";
import { DeskApiError, deskApi, deskKeys, type QuestionResponse } from "./api";
import { useDeskMessages } from "./desk-messages";

export function useQuestion(id: number, refreshMs = 30_000) {
  return useQuery({
    queryKey: deskKeys.question(id),
    queryFn: () => deskApi.question(id),
    select: (data) => data.question,
    refetchInterval: refreshMs,
    refetchOnWindowFocus: true,
  });
}

export interface QuestionMutationOptions<V, R extends QuestionResponse> {
  /** What the status line says after it worked. */
  success: (question: QuestionDetail, variables: V, result: R) => string;
  /** Field messages from a 400 go to the form, not to the alert. */
  onFieldErrors?: (fields: Record<string, string>) => void;
  onDone?: (question: QuestionDetail, variables: V, result: R) => void;
  /** Other questions this step changes too (a merge changes the one joined to). */
  alsoChanges?: (variables: V) => number[];
}

/**
 * A step on one question: the answer replaces the cached question, the queue and the check list
 * refresh, and a refusal is shown as the server worded it. A 409 (the state moved on meanwhile)
 * also fetches the question again, so the buttons match its real state.
 */
export function useQuestionMutation<V, R extends QuestionResponse = QuestionResponse>(
  id: number,
  mutationFn: (variables: V) => Promise<R>,
  options: QuestionMutationOptions<V, R>,
) {
  const queryClient = useQueryClient();
  const messages = useDeskMessages();
  return useMutation<R, Error, V>({
    mutationFn,
    onSuccess: (result, variables) => {
      queryClient.setQueryData<QuestionResponse>(deskKeys.question(id), { question: result.question });
      for (const other of options.alsoChanges?.(variables) ?? []) void queryClient.invalidateQueries({ queryKey: deskKeys.question(other) });
      void queryClient.invalidateQueries({ queryKey: deskKeys.queues });
      void queryClient.invalidateQueries({ queryKey: deskKeys.checks });
      messages.announce(options.success(result.question, variables, result));
      options.onDone?.(result.question, variables, result);
    },
    onError: (error) => {
      if (error instanceof DeskApiError && error.status === 400 && Object.keys(error.fields).length > 0 && options.onFieldErrors) {
        options.onFieldErrors(error.fields);
        return;
      }
      messages.alert(error.message);
      if (error instanceof DeskApiError && (error.status === 409 || error.status === 404)) {
        void queryClient.invalidateQueries({ queryKey: deskKeys.question(id) });
        void queryClient.invalidateQueries({ queryKey: deskKeys.queues });
      }
    },
  });
}
