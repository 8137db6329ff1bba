// Ctrl-C while generating: the first SIGINT asks for a clean stop (workers finish their current
// member, results are written); a second one exits at once. Every catalog write is a transaction,
// so the file stays consistent either way.
export const INTERRUPTED_EXIT_CODE = 130;

/** Installs the handler; returns a function that removes it. */
export function handleInterrupts(onFirst: () => void, log: (line: string) => void): () => void {
  let count = 0;
  const handler = () => {
    count += 1;
    if (count === 1) {
      log('interrupt: stopping after the current member of each running family (Ctrl-C again to quit at once)');
      onFirst();
    } else {
      log('interrupt: quitting now; families already written stay in the catalog');
      process.exit(INTERRUPTED_EXIT_CODE);
    }
  };
  process.on('SIGINT', handler);
  return () => {
    process.off('SIGINT', handler);
  };
}
