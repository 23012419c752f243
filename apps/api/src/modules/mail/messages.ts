import { printable } from "../../text/printable.js";
import type { Study } from "../studies/study.entity.js";
import type { StudyStatus } from "../studies/study-status.js";
import type { MailContent } from "./outbox.js";

interface Person {
  email: string;
  displayName: string;
}

/** The study's one status (study-status.ts), as the last paragraph of every study e-mail. */
const statusParagraph = (status?: StudyStatus) =>
  status ? [`Status: ${status.label}. ${status.detail} Next: ${status.nextStep.action}.`] : [];

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

/** Plain text plus simple HTML, with the product's name and no tracking. */
function compose(
  to: Person,
  subject: string,
  paragraphs: string[],
  link: { href: string; label: string },
): MailContent {
  // Names and titles come from users: no control characters in headers or bodies.
  to = { ...to, displayName: printable(to.displayName, { singleLine: true }) };
  subject = printable(subject, { singleLine: true });
  paragraphs = paragraphs.map((p) => printable(p));
  const text = [
    `Hello ${to.displayName},`,
    "",
    ...paragraphs.flatMap((p) => [p, ""]),
    `${link.label}: ${link.href}`,
    "",
    "— Waymark",
  ].join("\n");
  const html = [
    `<div style="font-family:sans-serif;color:#1e2a32;max-width:560px">`,
    `<p>Hello ${escapeHtml(to.displayName)},</p>`,
    ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    `<p><a href="${escapeHtml(link.href)}" style="color:#1f4d45;font-weight:600">${escapeHtml(link.label)}</a></p>`,
    `<p style="color:#4a5862">— Waymark</p></div>`,
  ].join("");
  return { to: to.email, subject: `Waymark: ${subject}`, text, html };
}

export function invitationMessage(email: string, role: string, inviter: Person, link: string): MailContent {
  return compose(
    { email, displayName: "there" },
    `${inviter.displayName} invited you as ${role}`,
    [
      `${inviter.displayName} invited you to join your team's Waymark as ${role}.`,
      "The link below works once and expires in 72 hours.",
    ],
    { href: link, label: "Accept the invitation" },
  );
}

export function reviewRequestedMessage(
  reviewer: Person,
  study: Study,
  analyst: Person,
  baseUrl: string,
  status?: StudyStatus,
  /** from round 2: what changed since the last round, one sentence each */
  changes?: string[],
): MailContent {
  return compose(
    reviewer,
    `review requested for "${study.title}"`,
    [
      `${analyst.displayName} submitted "${study.title}" for review.`,
      ...(changes?.length ? [`What changed since the last round: ${changes.join(" ")}`] : []),
      ...statusParagraph(status),
    ],
    {
      href: `${baseUrl}/reviews/${study.id}`,
      label: "Open the review",
    },
  );
}

export function changesRequestedMessage(
  analyst: Person,
  study: Study,
  reviewer: Person,
  comment: string,
  baseUrl: string,
  status?: StudyStatus,
): MailContent {
  return compose(
    analyst,
    `changes requested on "${study.title}"`,
    [
      `${reviewer.displayName} sent "${study.title}" back with this comment:`,
      comment,
      ...statusParagraph(status),
    ],
    {
      href: `${baseUrl}/studies/${study.id}`,
      label: "Open the study",
    },
  );
}

export function approvedMessage(
  analyst: Person,
  study: Study,
  reviewer: Person,
  baseUrl: string,
  status?: StudyStatus,
): MailContent {
  return compose(
    analyst,
    `"${study.title}" was approved`,
    [
      `${reviewer.displayName} approved "${study.title}" with an electronic signature.`,
      ...statusParagraph(status),
    ],
    {
      href: `${baseUrl}/studies/${study.id}`,
      label: "Open the study",
    },
  );
}

export function reportReadyMessage(
  writer: Person,
  study: Study,
  baseUrl: string,
  status?: StudyStatus,
): MailContent {
  return compose(
    writer,
    `report ready for "${study.title}"`,
    [
      `"${study.title}" was approved; its methods-and-results section can now be downloaded.`,
      ...statusParagraph(status),
    ],
    {
      href: `${baseUrl}/reports/${study.id}`,
      label: "Open the report",
    },
  );
}
