import type { CheckItem, PersonalDetailWarning, QuestionDetail, QueuePage, SnippetView, StaffRef } from "@/lib/questions/desk-types";

// The desk's JSON API as the browser calls it: same-origin fetches, JSON both ways, and one error
// type that carries the server's message, its field messages (400) and its code (409).

export class DeskApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields: Record<string, string> = {},
    readonly code?: string,
  ) {
    super(message);
    this.name = "DeskApiError";
  }
}

function messageForStatus(status: number): string {
  if (status === 401) return "Your session has ended. Sign in again, then try once more.";
  if (status === 403) return "Your role does not allow this.";
  if (status === 404) return "This question or item no longer exists.";
  if (status === 409) return "The question changed in the meantime, so this step is not possible now.";
  if (status >= 500) return "The server could not do this just now. Nothing was changed; try again in a moment.";
  return `The server refused this (${status}).`;
}

export async function deskFetch<T>(path: string, init: { method?: "GET" | "POST" | "PUT" | "PATCH" | "DELETE"; body?: unknown } = {}): Promise<T> {
  const method = init.method ?? "GET";
  let response: Response;
  try {
    response = await fetch(path, {
      method,
      credentials: "same-origin",
      cache: "no-store",
      headers: {
        Accept: "application/json",
        ...(init.body !== undefined || method !== "GET" ? { "Content-Type": "application/json" } : {}),
      },
      body: init.body !== undefined ? JSON.stringify(init.body) : method !== "GET" && method !== "DELETE" ? "{}" : undefined,
    });
  } catch {
    throw new DeskApiError(0, "The server could not be reached. Check the connection; nothing was changed.");
  }
  if (response.status === 204) return undefined as T;
  const data: unknown = await response.json().catch(() => null);
  if (!response.ok) {
    const body = (data && typeof data === "object" ? data : {}) as { error?: unknown; errors?: unknown; code?: unknown };
    const fields =
      body.errors && typeof body.errors === "object"
        ? Object.fromEntries(Object.entries(body.errors as Record<string, unknown>).filter((e): e is [string, string] => typeof e[1] === "string"))
        : {};
    const message =
      typeof body.error === "string"
        ? body.error
        : Object.keys(fields).length > 0
          ? (fields._form ?? "Some fields need fixing.")
          : messageForStatus(response.status);
    throw new DeskApiError(response.status, message, fields, typeof body.code === "string" ? body.code : undefined);
  }
  return data as T;
}

/** Query keys: one per resource, so a mutation can replace or refresh just what it changed. */
export const deskKeys = {
  all: ["desk"] as const,
  queues: ["desk", "queue"] as const,
  queue: (query: string) => ["desk", "queue", query] as const,
  question: (id: number) => ["desk", "question", id] as const,
  assignees: ["desk", "assignees"] as const,
  checks: ["desk", "checks"] as const,
  snippets: ["desk", "snippets"] as const,
};

export type QuestionResponse = { question: QuestionDetail };

export const deskApi = {
  queue: (query: string) => deskFetch<QueuePage>(`/api/staff/questions${query ? `?${query}` : ""}`),
  question: (id: number) => deskFetch<QuestionResponse>(`/api/staff/questions/${id}`),
  assignees: () => deskFetch<{ staff: StaffRef[] }>("/api/staff/assignees"),
  checks: () => deskFetch<{ items: CheckItem[] }>("/api/staff/checks"),
  snippets: () => deskFetch<{ snippets: SnippetView[] }>("/api/staff/snippets"),
  assign: (id: number, assigneeId: number | null) => deskFetch<QuestionResponse>(`/api/staff/questions/${id}/assign`, { method: "POST", body: { assigneeId } }),
  note: (id: number, body: string) => deskFetch<QuestionResponse>(`/api/staff/questions/${id}/notes`, { method: "POST", body: { body } }),
  draft: (id: number, bodyMarkdown: string, publicQuestion: string) =>
    deskFetch<QuestionResponse & { warnings: PersonalDetailWarning[] }>(`/api/staff/questions/${id}/drafts`, {
      method: "POST",
      body: { bodyMarkdown, publicQuestion },
    }),
  technical: (id: number, technical: boolean) => deskFetch<QuestionResponse>(`/api/staff/questions/${id}/technical`, { method: "PUT", body: { technical } }),
  check: (id: number) => deskFetch<QuestionResponse>(`/api/staff/questions/${id}/check`, { method: "POST", body: {} }),
  review: (id: number, decision: "approve" | "changes", comment: string) =>
    deskFetch<QuestionResponse>(`/api/staff/questions/${id}/review`, { method: "POST", body: { decision, comment } }),
  send: (id: number) => deskFetch<QuestionResponse>(`/api/staff/questions/${id}/send`, { method: "POST", body: {} }),
  publish: (id: number, questionText: string, schoolId: number | null, topic: string) =>
    deskFetch<QuestionResponse>(`/api/staff/questions/${id}/publish`, { method: "POST", body: { questionText, schoolId, topic } }),
  unpublish: (answerId: number) => deskFetch<QuestionResponse>(`/api/staff/answers/${answerId}/unpublish`, { method: "POST", body: {} }),
  decline: (id: number, reason: string) => deskFetch<QuestionResponse>(`/api/staff/questions/${id}/decline`, { method: "POST", body: { reason } }),
  merge: (id: number, intoId: number) => deskFetch<QuestionResponse>(`/api/staff/questions/${id}/merge`, { method: "POST", body: { intoId } }),
  createSnippet: (title: string, bodyMarkdown: string) => deskFetch<{ snippet: SnippetView }>("/api/staff/snippets", { method: "POST", body: { title, bodyMarkdown } }),
  updateSnippet: (id: number, title: string, bodyMarkdown: string) =>
    deskFetch<{ snippet: SnippetView }>(`/api/staff/snippets/${id}`, { method: "PATCH", body: { title, bodyMarkdown } }),
  deleteSnippet: (id: number) => deskFetch<void>(`/api/staff/snippets/${id}`, { method: "DELETE" }),
};
