import { openApiDocument } from '../src/lib/api/openapi.ts';
const d = openApiDocument() as any;
console.log(Object.keys(d.components.schemas));
console.log(JSON.stringify(d.components.schemas.AnalyzeRequest, null, 0).slice(0, 3000));
console.log(JSON.stringify(d.components.schemas.TuneRequest, null, 0).slice(0, 3000));
