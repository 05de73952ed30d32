import { openBrowser } from '../e2e/browser.js';
import { ensureChromium } from '../e2e/chromium.js';
import { median, round } from './stats.js';

/**
 * Time from the widget's script tag entering a plain page to the widget's first interactive render
 * (its tub-length field in the shadow root), in headless Chromium with a fresh cache each time.
 * Median of `runs`. The page is served by the gateway itself: the widget needs no API to render.
 */
export async function widgetFirstRender(baseUrl: string, runs = 10): Promise<{ medianMs: number; samplesMs: number[] }> {
  ensureChromium();
  const samples: number[] = [];
  for (let i = 0; i < runs; i++) {
    const browser = await openBrowser();
    try {
      const { page } = browser;
      await page.goto(`${baseUrl}/api/v1/health`);
      const ms = await page.evaluate(async (src) => {
        document.body.innerHTML = '<tw-rack-sizer key="tw_pk_bench"></tw-rack-sizer>';
        const started = performance.now();
        const script = document.createElement('script');
        script.type = 'module';
        script.src = src;
        document.head.append(script);
        for (;;) {
          const field = document.querySelector('tw-rack-sizer')?.shadowRoot?.querySelector('input');
          if (field) return performance.now() - started;
          await new Promise((r) => requestAnimationFrame(r));
        }
      }, `${baseUrl}/widget/tw-rack-sizer.js?run=${i}`);
      samples.push(ms);
    } finally {
      await browser.close();
    }
  }
  return { medianMs: round(median(samples), 0), samplesMs: samples.map((s) => round(s, 0)) };
}
