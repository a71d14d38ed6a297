import { expect, test, type Page } from '@playwright/test';
import { HARROW_SCENES, VIEWPORTS, sceneIdByTitle, signIn, withSceneCopy } from './helpers';

/**
 * The reach envelope while the truck is dragged. The worker answers the grid and a bitmap of the envelope
 * (transferred, not copied); on drag frames the plan draws that bitmap once and no cell outlines, so the
 * main thread's work per frame does not grow with the envelope's thousands of cells. Counted, not timed.
 */

interface Seen {
  jobs: { kind: string; scale: number | null }[];
  answers: { kind: string; image: string | null; ccw: string | null; shapes: boolean; cutBy: number }[];
}

/** Records the envelope worker's jobs and answers, before the editor's scripts run. */
async function watchWorker(page: Page) {
  await page.addInitScript(() => {
    const seen: Seen = { jobs: [], answers: [] };
    (window as unknown as { __envelopeSeen: Seen }).__envelopeSeen = seen;
    const W = window.Worker;
    window.Worker = class extends W {
      constructor(url: string | URL, opts?: WorkerOptions) {
        super(url, opts);
        this.addEventListener('message', (e: MessageEvent) => {
          const d = e.data as { kind?: string; picture?: { image?: unknown } | null; grid?: { ccw?: unknown } | null; shapes?: unknown; cutBy?: string[] };
          seen.answers.push({
            kind: String(d.kind),
            image: d.picture?.image ? (d.picture.image as object).constructor.name : null,
            ccw: d.grid?.ccw ? (d.grid.ccw as object).constructor.name : null,
            shapes: d.shapes != null,
            cutBy: d.cutBy?.length ?? 0,
          });
        });
      }
      postMessage(message: unknown, options?: unknown) {
        const m = message as { kind?: string; picture?: { scale?: number } | null };
        seen.jobs.push({ kind: String(m.kind), scale: m.picture?.scale ?? null });
        return super.postMessage(message, options as StructuredSerializeOptions);
      }
    };
  });
}

/** Counts path building and bitmap drawing on the page's canvases (the main thread's, not the worker's). */
async function countCanvasCalls(page: Page) {
  await page.evaluate(() => {
    const counts = { lineTo: 0, bitmaps: 0 };
    const P = CanvasRenderingContext2D.prototype;
    const lineTo = P.lineTo;
    P.lineTo = function (this: CanvasRenderingContext2D, x: number, y: number) {
      counts.lineTo += 1;
      return lineTo.call(this, x, y);
    };
    const drawImage = P.drawImage as (...a: unknown[]) => void;
    P.drawImage = function (this: CanvasRenderingContext2D, ...a: unknown[]) {
      if (a[0] instanceof ImageBitmap) counts.bitmaps += 1;
      return drawImage.apply(this, a);
    } as typeof P.drawImage;
    (window as unknown as { __canvasCalls: typeof counts }).__canvasCalls = counts;
  });
  return () => page.evaluate(() => ({ ...(window as unknown as { __canvasCalls: { lineTo: number; bitmaps: number } }).__canvasCalls }));
}

/** Moves the truck east 5 cm a frame for `frames` frames, as one gesture, through the editor's store. */
async function dragTruck(page: Page, frames: number) {
  await page.evaluate(
    (n) =>
      new Promise<void>((resolve) => {
        const store = (window as unknown as { __arclineEditor: { store: { getState(): { document: { objects: { kind: string; x: number }[] }; run(f: (d: unknown) => unknown): void } } } }).__arclineEditor.store;
        const x0 = store.getState().document.objects.find((o) => o.kind === 'truck')!.x;
        let i = 0;
        const frame = () => {
          if (i++ >= n) return requestAnimationFrame(() => requestAnimationFrame(() => resolve()));
          const x = x0 + 0.05 * i;
          store.getState().run((doc) => {
            const d = doc as { objects: { kind: string }[] };
            return { document: { ...d, objects: d.objects.map((o) => (o.kind === 'truck' ? { ...o, x } : o)) }, capture: 'gesture' };
          });
          requestAnimationFrame(frame);
        };
        requestAnimationFrame(frame);
      }),
    frames,
  );
}

const seen = (page: Page) => page.evaluate(() => (window as unknown as { __envelopeSeen: Seen }).__envelopeSeen);

test('the reach envelope is painted in the worker and drawn as one bitmap on drag frames', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  await withSceneCopy(page, HARROW_SCENES.coil, 'Envelope check (coil copy)', async (id) => {
    await watchWorker(page);
    await page.goto(`/scenes/${id}`);
    await expect(page.getByTestId('live-readout')).toBeVisible({ timeout: 30_000 });
    const key = page.getByTestId('reach-envelope-key');
    await page.getByTestId('reach-envelope-toggle').click();
    await expect(page.getByTestId('reach-envelope-ms')).toHaveText(/Worked out in [\d,.]+ ms beside the editor\.$/, { timeout: 30_000 });
    await expect(key).toContainText('tipping');
    await expect(key).toContainText('load chart');
    await expect(key).toContainText('manufacturer');

    // The answer: a grid in typed arrays and an ImageBitmap, no cell polygons.
    const first = await seen(page);
    expect(first.jobs[0]).toMatchObject({ kind: 'grid' });
    expect(first.jobs[0]!.scale).toBeGreaterThan(0);
    expect(first.answers.at(-1)).toMatchObject({ kind: 'grid', image: 'ImageBitmap', ccw: 'Float64Array', shapes: false });

    // Drag frames with the envelope shown draw the bitmap and build no more paths than with it hidden.
    const read = await countCanvasCalls(page);
    const before = await read();
    await dragTruck(page, 30);
    const shown = await read();
    await page.getByTestId('reach-envelope-toggle').click();
    await expect(key).toBeHidden();
    await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
    const off = await read();
    await dragTruck(page, 30);
    const hidden = await read();
    const withEnvelope = { lineTo: shown.lineTo - before.lineTo, bitmaps: shown.bitmaps - before.bitmaps };
    const without = { lineTo: hidden.lineTo - off.lineTo, bitmaps: hidden.bitmaps - off.bitmaps };
    // Konva draws once per animation frame; a slow frame takes in two moves, so fewer draws than moves.
    expect(withEnvelope.bitmaps).toBeGreaterThanOrEqual(10);
    expect(without.bitmaps).toBe(0);
    // The envelope has thousands of cells (36 × 240 nodes); drawn as paths, each frame would add tens of thousands.
    expect(withEnvelope.lineTo).toBeLessThan(without.lineTo + 30 * 200);

    // The drag asked for new grids; each answer again a bitmap.
    const dragged = await seen(page);
    expect(dragged.jobs.filter((j) => j.kind === 'grid').length).toBeGreaterThan(first.jobs.filter((j) => j.kind === 'grid').length);
    expect(dragged.answers.every((a) => a.image === 'ImageBitmap' && !a.shapes)).toBe(true);

    // Zooming in asks the worker for a sharper bitmap of the same grid, not a new grid.
    await page.getByTestId('reach-envelope-toggle').click();
    await expect(page.getByTestId('reach-envelope-ms')).toHaveText(/beside the editor\.$/, { timeout: 30_000 });
    const gridsBefore = (await seen(page)).jobs.filter((j) => j.kind === 'grid').length;
    const pxPerM = await page.evaluate(() => (window as unknown as { __arclineEditor: { store: { getState(): { camera: { pxPerM: number } } } } }).__arclineEditor.store.getState().camera.pxPerM);
    const plan = page.getByTestId('plan-view');
    const box = (await plan.boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    for (let i = 0; i < 4; i++) await page.mouse.wheel(0, -200);
    await expect.poll(async () => (await seen(page)).jobs.filter((j) => j.kind === 'picture').length).toBeGreaterThan(0);
    const zoomed = await seen(page);
    const lastPicture = zoomed.jobs.filter((j) => j.kind === 'picture').at(-1)!;
    expect(lastPicture.scale!).toBeGreaterThan(pxPerM * 1.25);
    expect(zoomed.jobs.filter((j) => j.kind === 'grid').length).toBe(gridsBefore);
    await expect(page.getByTestId('reach-envelope-ms')).toHaveText(/beside the editor\.$/, { timeout: 30_000 });
    expect((await seen(page)).answers.at(-1)).toMatchObject({ kind: 'picture', image: 'ImageBitmap' });
  });
});

test('screens: the reach envelope on the plan', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  for (const [name, title] of [['coil', HARROW_SCENES.coil], ['reefer', HARROW_SCENES.reefer]] as const) {
    await page.setViewportSize(VIEWPORTS.laptop);
    const id = await sceneIdByTitle(page, title);
    await page.goto(`/scenes/${id}`);
    await expect(page.getByTestId('live-readout')).toBeVisible({ timeout: 30_000 });
    await page.getByTestId('reach-envelope-toggle').click();
    const done = page.getByTestId('reach-envelope-ms');
    await expect(done).toHaveText(/beside the editor\.$/, { timeout: 30_000 });
    // Each size asks the worker for a bitmap of its own view: wait for it before each shot.
    for (const v of ['laptop', 'tablet-portrait'] as const) {
      await page.setViewportSize(VIEWPORTS[v]);
      await page.waitForTimeout(400);
      await expect(done).toHaveText(/beside the editor\.$/, { timeout: 30_000 });
      await page.screenshot({ path: `test-results/screens/reach-envelope-${name}-${v}.png`, fullPage: true });
    }
    // Zoomed in on the truck: the sharper bitmap the zoom asks for.
    await page.setViewportSize(VIEWPORTS.laptop);
    const box = (await page.getByTestId('plan-view').boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    for (let i = 0; i < 3; i++) await page.mouse.wheel(0, -200);
    await page.waitForTimeout(400);
    await expect(done).toHaveText(/beside the editor\.$/, { timeout: 30_000 });
    await page.screenshot({ path: `test-results/screens/reach-envelope-${name}-zoomed-laptop.png` });
  }
});
