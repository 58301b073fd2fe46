import type { IsoDate } from "@/lib/school-days/calendar";

export interface ConfirmationDetails {
  districtName: string;
  reference: string;
  question: string;
  /** The school's name, or null for a district-wide question. */
  schoolName: string | null;
  topicLabel: string;
  room: string | null;
  askerName: string | null;
  /** e.g. "Spanish (español)". */
  languageName: string;
  technical: boolean;
  targetSchoolDays: number;
  replyBy: IsoDate;
  statusUrl: string;
}

export interface ConfirmationMail {
  subject: string;
  text: string;
  html: string;
}

const longDate = new Intl.DateTimeFormat("en-US", { weekday: "long", month: "long", day: "numeric", year: "numeric", timeZone: "UTC" });

/** "Friday, December 4, 2026": a calendar date, so noon UTC keeps it on its own day in every zone. */
export function formatReplyDate(date: IsoDate): string {
  return longDate.format(new Date(`${date}T12:00:00Z`));
}

export function escapeHtml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&#39;");
}

function schoolDays(n: number): string {
  return n === 1 ? "1 school day" : `${n} school days`;
}

/** The e-mail that tells an asker we have their question: in our own words, text and HTML. */
export function confirmationMail(d: ConfirmationDetails): ConfirmationMail {
  const topic = d.topicLabel.toLowerCase();
  const school = d.schoolName ?? "All schools (district-wide)";
  const greeting = d.askerName ? `Hello ${d.askerName},` : "Hello,";
  const due = formatReplyDate(d.replyBy);
  const steps = [
    `A staff member who knows about ${topic} reads your question.`,
    ...(d.technical ? [`Because it is about ${topic}, our facilities team checks the answer before we send it.`] : []),
    "We send the answer to this e-mail address. We may also publish it, without your name or any personal details, so other families can read it.",
  ];
  const target =
    d.targetSchoolDays > 0
      ? `We aim to reply within ${schoolDays(d.targetSchoolDays)}, by ${due}. School days do not count weekends or district holidays.`
      : `We aim to reply by ${due}.`;
  const health =
    "If a child is sick now, please do not wait for our reply: call the school nurse or your doctor. In an emergency, call 911. Decisions about quarantine are made by the local health department.";
  const details: [string, string][] = [
    ["Reference", d.reference],
    ["School", school],
    ["Topic", d.topicLabel],
    ...(d.room ? ([["Room or grade", d.room]] as [string, string][]) : []),
    ["Reply language", d.languageName],
  ];

  const text = [
    greeting,
    "",
    `Thank you for your question to ${d.districtName}. It has reached us, and its reference is ${d.reference}.`,
    "",
    "YOUR QUESTION",
    ...details.map(([k, v]) => `${k}: ${v}`),
    "",
    ...d.question.split(/\r?\n/).map((line) => `> ${line}`),
    "",
    "WHAT HAPPENS NEXT",
    ...steps.map((s, i) => `${i + 1}. ${s}`),
    "",
    target,
    "",
    "FOLLOW YOUR QUESTION",
    "This private link shows where your question is, and the answer once we send it:",
    d.statusUrl,
    "",
    "Keep this link to yourself: anyone who has it can read your question. We will never ask you for it.",
    "",
    health,
    "",
    "If you did not send this question, you can ignore this e-mail.",
    "",
    d.districtName,
  ].join("\n");

  const e = escapeHtml;
  const h2 = (title: string) => `<h2 style="font-size:18px;color:#132840;margin:24px 0 8px">${e(title)}</h2>`;
  const html = `<!doctype html>
<html lang="en">
<head><meta charset="utf-8"><title>${e(`Your question ${d.reference}`)}</title></head>
<body style="margin:0;padding:0;background:#fbf7ef;color:#1c2530;font-family:Verdana,Arial,sans-serif;font-size:16px;line-height:1.5">
<div style="max-width:600px;margin:0 auto;padding:24px">
<p style="font-size:14px;color:#45505c;margin:0 0 16px">${e(d.districtName)}</p>
<p>${e(greeting)}</p>
<p>Thank you for your question. It has reached us, and its reference is <strong>${e(d.reference)}</strong>.</p>
${h2("Your question")}
<table role="presentation" style="border-collapse:collapse">
${details.map(([k, v]) => `<tr><td style="padding:2px 12px 2px 0;color:#45505c">${e(k)}</td><td style="padding:2px 0"><strong>${e(v)}</strong></td></tr>`).join("\n")}
</table>
<blockquote style="margin:12px 0;padding:12px 16px;border-left:6px solid #1d3a5f;background:#ffffff;white-space:pre-wrap">${e(d.question)}</blockquote>
${h2("What happens next")}
<ol style="padding-left:24px">
${steps.map((s) => `<li>${e(s)}</li>`).join("\n")}
</ol>
<p>${e(target)}</p>
${h2("Follow your question")}
<p>This private link shows where your question is, and the answer once we send it:</p>
<p><a href="${e(d.statusUrl)}" style="color:#1d3a5f;font-weight:bold">See the status of ${e(d.reference)}</a></p>
<p style="font-size:14px;color:#45505c">Or copy this address into your browser: ${e(d.statusUrl)}</p>
<p>Keep this link to yourself: anyone who has it can read your question. We will never ask you for it.</p>
<p style="padding:12px 16px;border-left:6px solid #a63f0c;background:#fbe9dc">${e(health)}</p>
<p style="font-size:14px;color:#45505c">If you did not send this question, you can ignore this e-mail.</p>
<p>${e(d.districtName)}</p>
</div>
</body>
</html>`;

  return { subject: `We received your question (${d.reference})`, text, html };
}
