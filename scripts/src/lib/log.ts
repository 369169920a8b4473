const useColor = process.stdout.isTTY && !process.env.NO_COLOR;

function paint(code: string, text: string): string {
  return useColor ? `\u001b[${code}m${text}\u001b[0m` : text;
}

export const color = {
  bold: (text: string) => paint('1', text),
  dim: (text: string) => paint('2', text),
  red: (text: string) => paint('31', text),
  green: (text: string) => paint('32', text),
  yellow: (text: string) => paint('33', text),
  cyan: (text: string) => paint('36', text),
};

export function log(message: string): void {
  console.log(`${color.cyan('[driftmark]')} ${message}`);
}

export function warn(message: string): void {
  console.warn(`${color.yellow('[driftmark]')} ${message}`);
}

export function fail(message: string): void {
  console.error(`${color.red('[driftmark]')} ${message}`);
}

export function seconds(ms: number): string {
  return `${(ms / 1000).toFixed(1)} s`;
}
