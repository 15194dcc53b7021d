import "server-only";
import type { OutgoingMail } from "./transport";

function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

function layout(paragraphs: string[], action: { label: string; url: string }, footer: string): string {
  const body = paragraphs.map((p) => `<p style="margin:0 0 12px">${escapeHtml(p)}</p>`).join("");
  const url = escapeHtml(action.url);
  return `<!doctype html><html><body style="font-family:system-ui,sans-serif;color:#12343b;max-width:560px">
${body}<p style="margin:20px 0"><a href="${url}" style="background:#12343b;color:#fff;padding:10px 16px;border-radius:4px;text-decoration:none">${escapeHtml(action.label)}</a></p>
<p style="margin:0 0 12px;font-size:13px">If the button does not work, open this address: <a href="${url}">${url}</a></p>
<p style="margin:16px 0 0;font-size:13px;color:#2d545e">${escapeHtml(footer)}</p></body></html>`;
}

export function verificationMail(to: string, name: string, url: string): OutgoingMail {
  const lines = [`Hello ${name},`, "Please confirm your e-mail address to finish creating your Heterolane account."];
  const footer = "The link is valid for one hour and works once. If you did not sign up, ignore this message.";
  return {
    to,
    subject: "Confirm your e-mail address for Heterolane",
    text: `${lines.join("\n\n")}\n\nConfirm: ${url}\n\n${footer}\n`,
    html: layout(lines, { label: "Confirm e-mail address", url }, footer),
  };
}

export function resetPasswordMail(to: string, name: string, url: string): OutgoingMail {
  const lines = [`Hello ${name},`, "Someone asked to reset the password of your Heterolane account."];
  const footer =
    "The link is valid for one hour and works once. If it was not you, ignore this message; your password stays as it is.";
  return {
    to,
    subject: "Reset your Heterolane password",
    text: `${lines.join("\n\n")}\n\nChoose a new password: ${url}\n\n${footer}\n`,
    html: layout(lines, { label: "Choose a new password", url }, footer),
  };
}

export function invitationMail(to: string, inviter: string, team: string, role: string, url: string): OutgoingMail {
  const lines = [`${inviter} invited you to join the team "${team}" on Heterolane as ${role}.`];
  const footer = "Sign in or create an account with this e-mail address to accept. The invitation expires in 48 hours.";
  return {
    to,
    subject: `Invitation to join ${team} on Heterolane`,
    text: `${lines.join("\n\n")}\n\nOpen the invitation: ${url}\n\n${footer}\n`,
    html: layout(lines, { label: "Open the invitation", url }, footer),
  };
}

export function existingAccountMail(to: string, name: string, signInUrl: string, resetUrl: string): OutgoingMail {
  const lines = [
    `Hello ${name},`,
    "Someone tried to create a Heterolane account with this e-mail address, which already has one. No new account was made.",
    `If it was you, sign in instead, or choose a new password: ${resetUrl}`,
  ];
  const footer = "If it was not you, you can ignore this message; nothing changed.";
  return {
    to,
    subject: "You already have a Heterolane account",
    text: `${lines.join("\n\n")}\n\nSign in: ${signInUrl}\n\n${footer}\n`,
    html: layout(lines, { label: "Sign in", url: signInUrl }, footer),
  };
}
