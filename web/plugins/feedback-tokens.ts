/**
 * Darker text for PrimeVue's Message and Toast severities: Aura's 600 shades on their
 * pale backgrounds fall below WCAG AA (yellow.600 on yellow.50 is 2.8:1). The 800 shades
 * reach 6.6:1 (warn) to 8.0:1 (info); simple messages on white use 700 (red.700: 6.5:1).
 */
const severities = { info: 'ink', success: 'green', warn: 'yellow', error: 'red' } as const;

function forEachSeverity<T>(make: (palette: string) => T): Record<keyof typeof severities, T> {
  const entries = Object.entries(severities).map(([severity, palette]) => [severity, make(palette)]);
  return Object.fromEntries(entries) as Record<keyof typeof severities, T>;
}

const messageLight = forEachSeverity((palette) => ({
  background: `{${palette}.50}`,
  borderColor: `{${palette}.200}`,
  color: `{${palette}.800}`,
  outlined: { color: `{${palette}.800}`, borderColor: `{${palette}.700}` },
  simple: { color: `{${palette}.700}` },
}));

const toastLight = forEachSeverity((palette) => ({
  background: `{${palette}.50}`,
  borderColor: `{${palette}.200}`,
  color: `{${palette}.800}`,
}));

export const feedbackComponents = {
  message: { colorScheme: { light: messageLight } },
  toast: { colorScheme: { light: toastLight } },
};
