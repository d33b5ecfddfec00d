import { chargeStateText } from "@shared/content/charge-states.ts";
import { VISIT_STATUS_LABELS, visitReasonText, type Visit } from "@shared/schemas/visits.ts";
import type { MailMessage } from "../mail/mailer.ts";
import { formatDateTime } from "@shared/format/date-time.ts";

const fixed = (value: number | null | undefined, decimals = 1) => (value == null ? "—" : value.toFixed(decimals));

const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (character) => `&#${character.charCodeAt(0)};`);

/**
 * The visit report as an e-mail: the summary a customer contact needs (what was found on each
 * circuit, what was changed, the sign-off) and a link to the full printable report.
 * Metric units, as stored; times in `timeZone` (the sender's, an IANA name), named beside them.
 */
export function visitReportMail(
  visit: Visit,
  reportUrl: string,
  to: string,
  organisationId: string,
  timeZone = "UTC",
): MailMessage {
  // Voided records are corrections: the report leaves them out (the audit trail keeps them).
  // The detail carries each circuit's latest page of readings only; its log holds the latest standing one.
  const logs = visit.circuitLogs.filter((log) => log.readingCount > 0 && log.keyReadings.length > 0);
  const adjustments = visit.adjustments.filter((adjustment) => adjustment.voided === null);
  const lines: string[] = [
    `Service visit report — ${visit.equipmentName}`,
    `${visit.customerName}, ${visit.siteName}`,
    `Refrigerant ${visit.refrigerant}. Started ${formatDateTime(visit.startedAt, timeZone)} (${timeZone} time).`,
    `Reason for the visit: ${visitReasonText(visit.reason)}`,
    `Status: ${VISIT_STATUS_LABELS[visit.status]}${visit.signedOffBy ? ` (signed off by ${visit.signedOffBy.name}${visit.signedOffAt ? ` on ${formatDateTime(visit.signedOffAt, timeZone)}` : ""})` : ""}`,
    "",
  ];
  for (const log of logs) {
    const last = log.keyReadings.at(-1)!;
    lines.push(
      `Circuit ${log.circuit}, last reading: ${chargeStateText[last.result.chargeState].title}.`,
      `  Evaporating ${fixed(last.result.evaporatingTempC)} °C, superheat ${fixed(last.result.superheatK)} K; condensing ${fixed(last.result.condensingTempC)} °C, subcooling ${fixed(last.result.subcoolingK)} K.`,
    );
  }
  if (logs.length === 0) lines.push("No readings were recorded.");
  if (adjustments.length > 0) {
    lines.push("", "Work done:");
    for (const adjustment of adjustments)
      lines.push(`  - ${adjustment.description}${adjustment.amountKg != null ? ` (${adjustment.amountKg} kg)` : ""}`);
  }
  lines.push("", `Full report: ${reportUrl}`);
  const text = lines.join("\n");
  const html = `<pre style="font-family: 'IBM Plex Mono', monospace; white-space: pre-wrap">${escapeHtml(text)}</pre>`;
  return { to, subject: `Service report: ${visit.equipmentName} at ${visit.siteName}`, text, html, organisationId };
}
