"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { TOPIC_LABELS } from "@/lib/questions/labels";
import { deskApi, deskKeys } from "./api";
import { formatDateTime, plural } from "./format";
import { LoadError } from "./load-error";

/** Technical answers waiting for facilities, oldest first as the server sends them. */
export function CheckList({ timeZone, refreshMs = 30_000 }: { timeZone: string; refreshMs?: number }) {
  const checks = useQuery({ queryKey: deskKeys.checks, queryFn: deskApi.checks, refetchInterval: refreshMs, refetchOnWindowFocus: true });
  const items = checks.data?.items ?? [];
  const summary = checks.isPending
    ? "Loading…"
    : checks.isError && !checks.data
      ? "The list could not be loaded."
      : items.length === 0
        ? "No answer is waiting for a check."
        : `${plural(items.length, "answer")} waiting for a check.`;
  return (
    <div>
      <p role="status" aria-live="polite" className="font-bold" data-testid="check-summary">
        {summary}
      </p>
      {checks.isError ? <LoadError message={checks.error.message} onRetry={() => checks.refetch()} /> : null}
      {items.length > 0 ? (
        <div className="mt-3 overflow-x-auto rounded-plate border-2 border-paper-line bg-white" role="region" aria-labelledby="check-caption" tabIndex={0}>
          <table className="w-full min-w-[48rem] border-collapse text-left text-sm" data-testid="check-table">
            <caption id="check-caption" className="sr-only">
              Answers waiting for a facilities check, oldest first
            </caption>
            <thead>
              <tr className="border-b-2 border-harbour align-bottom">
                <th scope="col" className="px-3 py-2">Question</th>
                <th scope="col" className="px-3 py-2">School</th>
                <th scope="col" className="px-3 py-2">Topic</th>
                <th scope="col" className="px-3 py-2">Sent for a check</th>
                <th scope="col" className="px-3 py-2">By</th>
              </tr>
            </thead>
            <tbody>
              {items.map((item) => (
                <tr key={item.id} className="border-b border-paper-line align-top" data-reference={item.reference}>
                  <td className="max-w-[26rem] px-3 py-2">
                    <Link href={`/staff/desk/${item.id}`} className="font-bold">
                      Check {item.reference}
                    </Link>
                    <p className="mt-0.5 text-ink-soft">{item.excerpt}</p>
                  </td>
                  <td className="px-3 py-2">{item.school?.name ?? "All schools"}</td>
                  <td className="px-3 py-2">{TOPIC_LABELS[item.topic] ?? item.topic}</td>
                  <td className="px-3 py-2 whitespace-nowrap">{formatDateTime(item.submittedAt, timeZone)}</td>
                  <td className="px-3 py-2">{item.submittedBy?.name ?? "—"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
    </div>
  );
}
