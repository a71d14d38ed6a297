/// <reference lib="webworker" />
/**
 * The placement advisor off the main thread: the same lib/advisor code as `npm run advise`. The page
 * cancels by terminating the worker.
 */
import { advise, AdvisorInputError } from '@/lib/advisor';
import type { SceneDocument } from '@/lib/scene/schema';
import { truckModelFromProfile, type TruckProfileInput } from '@/lib/scene/truck/from-spec';
import type { AdvisorWorkerReply } from './advisor-messages';

self.onmessage = (e: MessageEvent<{ document: SceneDocument; profile: TruckProfileInput }>) => {
  const post = (m: AdvisorWorkerReply) => self.postMessage(m);
  try {
    let last = 0;
    const result = advise(
      { document: e.data.document, model: truckModelFromProfile(e.data.profile) },
      {
        onProgress: ({ phase, fraction }) => {
          const now = performance.now();
          // A few updates a second are enough for a progress bar.
          if (now - last > 80 || fraction >= 1) {
            last = now;
            post({ type: 'progress', phase, fraction });
          }
        },
      },
    );
    post({ type: 'done', result });
  } catch (err) {
    post({ type: 'error', message: err instanceof AdvisorInputError ? err.message : 'The search stopped on an error; the plan itself is unchanged.' });
  }
};
