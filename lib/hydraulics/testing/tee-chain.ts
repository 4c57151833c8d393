/**
 * Loads in parallel on a chain of tees, from hp.flow back to hp.return: tee tf<i> / tr<i> take off
 * load i on their c ports (pipes fl<i>, rl<i>), pipes f<i> / ret<i> run along the mains, and the last
 * load closes the chain on the last tees' b ports.
 */
type Pipe = (id: string, from: string, to: string) => unknown;

export function teeChain(loads: readonly { id: string }[], cu: Pipe): { parts: unknown[]; pipes: unknown[] } {
  const parts: unknown[] = [];
  const pipes: unknown[] = [];
  let flowFrom = "hp.flow";
  let retTo = "hp.return";
  loads.forEach((l, i) => {
    parts.push(l);
    if (i === loads.length - 1) {
      pipes.push(cu(`f${i}`, flowFrom, `${l.id}.flow`), cu(`ret${i}`, `${l.id}.return`, retTo));
      return;
    }
    parts.push({ id: `tf${i}`, type: "tee" }, { id: `tr${i}`, type: "tee" });
    pipes.push(cu(`f${i}`, flowFrom, `tf${i}.a`), cu(`fl${i}`, `tf${i}.c`, `${l.id}.flow`), cu(`rl${i}`, `${l.id}.return`, `tr${i}.c`), cu(`ret${i}`, `tr${i}.a`, retTo));
    flowFrom = `tf${i}.b`;
    retTo = `tr${i}.b`;
  });
  return { parts, pipes };
}
