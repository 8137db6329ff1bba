// Epochs as text: ISO 8601 UTC calendar date and time to the microsecond, without a zone letter
// (CCSDS ODM time format; the time system is stated beside it), from fractional milliseconds since 1970.
export function formatEpochUtc(ms: number): string {
  const micros = Math.round(ms * 1000);
  const wholeMs = Math.floor(micros / 1000);
  const extraMicros = micros - wholeMs * 1000;
  const iso = new Date(wholeMs).toISOString(); // YYYY-MM-DDTHH:MM:SS.mmmZ
  return `${iso.slice(0, 23)}${String(extraMicros).padStart(3, '0')}`;
}
