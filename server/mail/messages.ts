import { ROLE_LABELS, type Role } from "@shared/schemas/auth.ts";
import { INVITATION_VALID_DAYS } from "@shared/schemas/invitations.ts";
import type { MailMessage } from "./mailer.ts";

/** Escapes text for the HTML part; names and company names come from users. */
function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (char) => `&#${char.charCodeAt(0)};`);
}

function layout(paragraphs: string[], link: { href: string; label: string }): string {
  const body = paragraphs.map((line) => `<p>${escapeHtml(line)}</p>`).join("");
  return `<!doctype html><html><body style="font-family:sans-serif;line-height:1.5">${body}<p><a href="${escapeHtml(link.href)}">${escapeHtml(link.label)}</a></p></body></html>`;
}

export function invitationMail(input: {
  to: string;
  organisationName: string;
  invitedByName: string;
  role: Role;
  link: string;
  organisationId: string;
}): MailMessage {
  const lines = [
    `${input.invitedByName} has invited you to join ${input.organisationName} on Satura as ${ROLE_LABELS[input.role].toLowerCase()}.`,
    `Open the link below to choose your name and password. It works once and expires in ${INVITATION_VALID_DAYS} days.`,
    "If you did not expect this, ignore this e-mail.",
  ];
  return {
    to: input.to,
    subject: `Join ${input.organisationName} on Satura`,
    text: `${lines.join("\n\n")}\n\n${input.link}\n`,
    html: layout(lines, { href: input.link, label: "Accept the invitation" }),
    organisationId: input.organisationId,
  };
}

export function passwordResetMail(input: {
  to: string;
  name: string;
  link: string;
  validMinutes: number;
  organisationId: string;
}): MailMessage {
  const lines = [
    `Hello ${input.name},`,
    `Someone asked to reset the password of your Satura account. Open the link below to choose a new one. It works once and expires in ${input.validMinutes} minutes.`,
    "If it was not you, ignore this e-mail: your password stays as it is.",
  ];
  return {
    to: input.to,
    subject: "Reset your Satura password",
    text: `${lines.join("\n\n")}\n\n${input.link}\n`,
    html: layout(lines, { href: input.link, label: "Choose a new password" }),
    organisationId: input.organisationId,
  };
}
