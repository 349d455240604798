/** How long a submission has waited, in the largest whole unit that says it plainly. */
export function waitingText(submittedAt: Date, now: Date = new Date()): string {
  const minutes = Math.max(0, Math.floor((now.getTime() - submittedAt.getTime()) / 60_000));
  if (minutes < 60) return `${minutes} min`;
  const hours = Math.floor(minutes / 60);
  if (hours < 48) return `${hours} h`;
  return `${Math.floor(hours / 24)} days`;
}
