import type { APIRoute } from 'astro';
import { revisionDiff } from '../../../../../lib/editorial/history';
import { editorialRoute, json, whole } from '../../../../../lib/editorial/http';
import { serverContext } from '../../../../../lib/editorial/server-context';

/** GET /api/v1/recipes/{slug}/diff?from=1&to=3: a line diff of fields and body between two revisions. */
export const GET: APIRoute = ({ params, request, locals, url }) =>
  editorialRoute(locals, async (actor) =>
    json(await revisionDiff(serverContext(request), actor, params.slug!, whole(url.searchParams.get('from'), 'from'), whole(url.searchParams.get('to'), 'to'))),
  );
