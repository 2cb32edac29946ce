import type { APIRoute } from 'astro';
import { editorialRoute, json } from '../../../lib/editorial/http';
import { reviewQueue } from '../../../lib/editorial/queue';
import { serverContext } from '../../../lib/editorial/server-context';
import { allRecipes } from '../../../lib/recipes/library';

/** GET /api/v1/review-queue (curator+): what waits for review, and which published recipes are stale. */
export const GET: APIRoute = ({ request, locals }) =>
  editorialRoute(locals, async (actor) => {
    const files = (await allRecipes()).filter((r) => r.source === 'file').map((r) => ({ slug: r.slug, title: r.data.title, reviewed: r.data.reviewed, status: r.data.status }));
    return json(await reviewQueue(serverContext(request), actor, files));
  });
