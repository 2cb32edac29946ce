import { z } from 'zod';
const TF = z.object({num: z.array(z.number()), den: z.array(z.number())}).strict();
const S = z.object({ plant: z.union([TF, z.array(TF).min(1)]) , x: z.object({y: z.number()}).refine(v=>v.y>0, {message:'m', path:['y']})});
console.log(JSON.stringify(S.safeParse({plant: [{num:[1], den:['a']}], x:{y:-1}}).error?.issues));
const R = z.object({ t: z.array(z.number()) }).superRefine((v, ctx) => { ctx.addIssue({ code: 'custom', message: 'bad', path: ['t', 3] }); });
console.log(JSON.stringify(R.safeParse({t:[1,2]}).error?.issues));
console.log(JSON.stringify(R.safeParse({t:[1,'x']}).error?.issues));
