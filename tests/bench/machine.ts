import os from 'node:os';

/** The machine the figures were measured on, in one line, for the README beside them. */
export function machineDescription(): string {
  const cpus = os.cpus();
  const memoryGiB = (os.totalmem() / 1024 ** 3).toFixed(1);
  return `${cpus.length} cores, ${cpus[0]?.model.trim() ?? 'unknown CPU'}, ${memoryGiB} GiB memory, Node ${process.version}, ${os.platform()} ${os.release()}`;
}
