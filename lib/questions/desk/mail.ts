import { escapeHtml } from "../confirmation-mail";
import { markdownToPlainText } from "@/lib/markdown/parse";

// The e-mails the desk sends: the reply, a polite decline, and staff notices. Plain words, text and HTML.

const HEALTH_LINE =
  "If a child is sick now, please do not wait for e-mail: call the school nurse or your doctor. In an emergency, call 911. Decisions about quarantine are made by the local health department.";

export interface ReplyMailDetails {
  districtName: string;
  reference: string;
  askerName: string | null;
  question: string;
  answerMarkdown: string;
  /** The public version on the answers page, if one is published. */
  publicUrl: string | null;
  statusUrl: string;
  /** True for an asker whose question was joined to another one. */
  joined: boolean;
}

export interface Mail {
  subject: string;
  text: string;
  html: string;
}

function paragraphsHtml(text: string): string {
  return text
    .split(/\n{2,}/)
    .map((p) => `<p>${escapeHtml(p).replace(/\n/g, "<br>")}</p>`)
    .join("\n");
}

function quote(text: string): string[] {
  return text.split(/\r?\n/).map((line) => `> ${line}`);
}

export function replyMail(d: ReplyMailDetails): Mail {
  const greeting = d.askerName ? `Hello ${d.askerName},` : "Hello,";
  const answer = markdownToPlainText(d.answerMarkdown);
  const intro = d.joined
    ? `Other families asked nearly the same question as you, so we answered them together. Here is our answer to your question ${d.reference}.`
    : `Here is our answer to your question ${d.reference}.`;
  const links = [
    ...(d.publicUrl ? [`We also published this answer, without your name or any personal details, for other families: ${d.publicUrl}`] : []),
    `Your question and this answer stay on your private page: ${d.statusUrl}`,
  ];
  const text = [
    greeting,
    "",
    intro,
    "",
    "YOUR QUESTION",
    ...quote(d.question),
    "",
    "OUR ANSWER",
    answer,
    "",
    ...links,
    "",
    "If something is still unclear, reply through the question form and give this reference.",
    "",
    HEALTH_LINE,
    "",
    `${d.districtName}`,
  ].join("\n");
  const html = [
    `<p>${escapeHtml(greeting)}</p>`,
    `<p>${escapeHtml(intro)}</p>`,
    `<h2 style="font-size:16px">Your question</h2>`,
    `<blockquote>${paragraphsHtml(d.question)}</blockquote>`,
    `<h2 style="font-size:16px">Our answer</h2>`,
    paragraphsHtml(answer),
    ...(d.publicUrl
      ? [`<p>We also published this answer, without your name or any personal details, for other families: <a href="${escapeHtml(d.publicUrl)}">${escapeHtml(d.publicUrl)}</a></p>`]
      : []),
    `<p>Your question and this answer stay on <a href="${escapeHtml(d.statusUrl)}">your private page</a>.</p>`,
    `<p>If something is still unclear, reply through the question form and give this reference.</p>`,
    `<p>${escapeHtml(HEALTH_LINE)}</p>`,
    `<p>${escapeHtml(d.districtName)}</p>`,
  ].join("\n");
  return { subject: `Our answer to your question ${d.reference}`, text, html };
}

export interface DeclineMailDetails {
  districtName: string;
  reference: string;
  askerName: string | null;
  question: string;
  reason: string;
  askUrl: string;
}

export function declineMail(d: DeclineMailDetails): Mail {
  const greeting = d.askerName ? `Hello ${d.askerName},` : "Hello,";
  const lines = [
    greeting,
    "",
    `Thank you for writing to us. We read your question ${d.reference} carefully, and we are sorry that the question desk cannot answer it.`,
    "",
    "WHY",
    d.reason,
    "",
    "YOUR QUESTION",
    ...quote(d.question),
    "",
    `You are welcome to ask us something else at any time: ${d.askUrl}`,
    "",
    HEALTH_LINE,
    "",
    d.districtName,
  ];
  const html = [
    `<p>${escapeHtml(greeting)}</p>`,
    `<p>Thank you for writing to us. We read your question ${escapeHtml(d.reference)} carefully, and we are sorry that the question desk cannot answer it.</p>`,
    `<h2 style="font-size:16px">Why</h2>`,
    paragraphsHtml(d.reason),
    `<h2 style="font-size:16px">Your question</h2>`,
    `<blockquote>${paragraphsHtml(d.question)}</blockquote>`,
    `<p>You are welcome to <a href="${escapeHtml(d.askUrl)}">ask us something else</a> at any time.</p>`,
    `<p>${escapeHtml(HEALTH_LINE)}</p>`,
    `<p>${escapeHtml(d.districtName)}</p>`,
  ].join("\n");
  return { subject: `About your question ${d.reference}`, text: lines.join("\n"), html };
}

export interface StaffNoticeDetails {
  reference: string;
  deskUrl: string;
  /** One or two sentences of what happened. */
  lines: string[];
  subject: string;
}

/** A short notice to staff; it carries no asker details, only the reference and a link. */
export function staffNoticeMail(d: StaffNoticeDetails): Mail {
  const text = [...d.lines, "", `Open it on the desk: ${d.deskUrl}`, "", "Clearhall question desk"].join("\n");
  const html = [
    ...d.lines.map((l) => `<p>${escapeHtml(l)}</p>`),
    `<p><a href="${escapeHtml(d.deskUrl)}">Open ${escapeHtml(d.reference)} on the desk</a></p>`,
    `<p>Clearhall question desk</p>`,
  ].join("\n");
  return { subject: d.subject, text, html };
}
