import type { Page } from 'playwright-core';

/** How much of a chart's canvas is drawn on: pixels that are not transparent, and how many distinct colours. */
export async function canvasInk(page: Page, selector: string): Promise<{ inked: number; total: number; colours: number }> {
  await page.locator(selector).first().waitFor();
  return page.locator(selector).first().evaluate((canvas: HTMLCanvasElement) => {
    const context = canvas.getContext('2d');
    if (!context) return { inked: 0, total: 0, colours: 0 };
    const { data } = context.getImageData(0, 0, canvas.width, canvas.height);
    let inked = 0;
    const colours = new Set<number>();
    for (let i = 0; i < data.length; i += 4) {
      if (data[i + 3] === 0) continue;
      inked++;
      colours.add(((data[i] >> 4) << 8) | ((data[i + 1] >> 4) << 4) | (data[i + 2] >> 4));
    }
    return { inked, total: data.length / 4, colours: colours.size };
  });
}

export async function fillByLabel(page: Page, label: string | RegExp, value: string): Promise<void> {
  const input = page.getByLabel(label, { exact: typeof label === 'string' });
  await input.fill(value);
}

/** The numbers in the live head preview once the engine has answered. */
export async function previewNumbers(page: Page): Promise<{ head: string; depth: string }> {
  const head = page.getByTestId('preview-head').first();
  await head.waitFor();
  return { head: (await head.textContent()) ?? '', depth: (await page.getByTestId('preview-control-depth').first().textContent()) ?? '' };
}

