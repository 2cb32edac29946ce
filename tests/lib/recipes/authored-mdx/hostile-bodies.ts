/**
 * Hostile authored bodies: each must be refused, or compile to HTML that cannot run code.
 * `refused` bodies must not compile; `inert` ones compile and are checked by `findActiveContent`
 * here and in Chromium (tests/browser/authored-mdx-corpus.test.ts). The tricks follow the
 * well-known XSS filter-evasion lists (common practice in web security testing).
 */
export interface HostileBody {
  name: string;
  body: string;
  expect: 'refused' | 'inert';
}

const PWN = 'window.__pwned=1';
const LOOP = 'model={{ type: "fopdt", k: 1.5, tau: 30, theta: 4 }} controller={{ form: "ideal", kc: 2, ti: 30 }}';

export const HOSTILE_BODIES: HostileBody[] = [
  // Raw HTML and unknown elements
  { name: 'script tag', body: `<script>${PWN}</script>`, expect: 'refused' },
  { name: 'script tag inside a paragraph', body: `Intro text <script>${PWN}</script> more.`, expect: 'refused' },
  { name: 'img with onerror', body: `<img src="x" onerror="${PWN}" />`, expect: 'refused' },
  { name: 'svg with onload', body: `<svg onload="${PWN}"></svg>`, expect: 'refused' },
  { name: 'svg foreignObject script', body: `<svg><foreignObject><script>${PWN}</script></foreignObject></svg>`, expect: 'refused' },
  { name: 'iframe javascript src', body: `<iframe src="javascript:${PWN}"></iframe>`, expect: 'refused' },
  { name: 'iframe srcdoc', body: `<iframe srcdoc="<script>${PWN}</script>"></iframe>`, expect: 'refused' },
  { name: 'anchor with javascript href', body: `<a href="javascript:${PWN}">click</a>`, expect: 'refused' },
  { name: 'object data', body: `<object data="javascript:${PWN}"></object>`, expect: 'refused' },
  { name: 'embed', body: '<embed src="https://evil.example/x.swf" />', expect: 'refused' },
  { name: 'form with javascript action', body: `<form action="javascript:${PWN}"><button>Go</button></form>`, expect: 'refused' },
  { name: 'style element', body: '<style>body { display: none }</style>', expect: 'refused' },
  { name: 'div with fixed-position style', body: '<div style="position:fixed;inset:0;background:red">Click me</div>', expect: 'refused' },
  { name: 'MathML mutation trick', body: `<math><mtext><img src="x" onerror="${PWN}" /></mtext></math>`, expect: 'refused' },
  { name: 'meta refresh', body: '<meta httpEquiv="refresh" content="0;url=javascript:alert(1)" />', expect: 'refused' },
  { name: 'link stylesheet', body: '<link rel="stylesheet" href="https://evil.example/x.css" />', expect: 'refused' },
  { name: 'base href', body: '<base href="https://evil.example/" />', expect: 'refused' },
  { name: 'unknown capitalised component', body: '<Script src="https://evil.example/x.js" />', expect: 'refused' },
  { name: 'member-expression component name', body: '<window.Alert />', expect: 'refused' },
  { name: 'namespaced element', body: '<xlink:a href="javascript:alert(1)">x</xlink:a>', expect: 'refused' },
  { name: 'fragment', body: `<>${'text'}</>`, expect: 'refused' },
  { name: 'HTML comment', body: '<!-- <script>alert(1)</script> -->', expect: 'refused' },
  { name: 'html inside a table cell', body: `| a | b |\n|---|---|\n| <script>${PWN}</script> | 2 |`, expect: 'refused' },
  // ES modules and expressions
  { name: 'import statement', body: "import fs from 'node:fs'\n\n# Title", expect: 'refused' },
  { name: 'export statement', body: `export const x = (${PWN})\n\n# Title`, expect: 'refused' },
  { name: 'flow expression', body: `{${PWN}}`, expect: 'refused' },
  { name: 'inline expression', body: 'The gain is {globalThis.process.exit(1)} today.', expect: 'refused' },
  { name: 'expression hidden after a comment', body: `{/* note */ ${PWN}}`, expect: 'refused' },
  { name: 'heading id expression', body: '# Title {#id}', expect: 'refused' },
  // Component attributes
  { name: 'spread attribute', body: '<LoopResponse {...globalThis} />', expect: 'refused' },
  { name: 'identifier as a prop value', body: '<LoopResponse model={globalThis.model} controller={{ form: "ideal", kc: 1 }} />', expect: 'refused' },
  { name: 'call in a prop value', body: `<LoopResponse model={(() => { ${PWN} })()} controller={{ form: "ideal", kc: 1 }} />`, expect: 'refused' },
  { name: 'new Function in a prop', body: '<LoopResponse model={new Function("alert(1)")} controller={{ form: "ideal", kc: 1 }} />', expect: 'refused' },
  { name: 'template literal prop', body: `<LoopResponse ${LOOP} title={\`x\${alert(1)}\`} />`, expect: 'refused' },
  { name: 'event handler prop as string', body: `<LoopResponse ${LOOP} onLoad="${PWN}" />`, expect: 'refused' },
  { name: 'dangerouslySetInnerHTML prop', body: `<LoopResponse ${LOOP} dangerouslySetInnerHTML={{ __html: "<img src=x onerror=alert(1)>" }} />`, expect: 'refused' },
  { name: '__proto__ key in a prop object', body: '<LoopResponse model={{ "__proto__": { "polluted": true }, type: "fopdt", k: 1, tau: 2, theta: 0 }} controller={{ form: "ideal", kc: 1 }} />', expect: 'refused' },
  { name: 'computed key in a prop object', body: '<LoopResponse model={{ [alert(1)]: 1 }} controller={{ form: "ideal", kc: 1 }} />', expect: 'refused' },
  { name: 'getter in a prop object', body: '<LoopResponse model={{ get type() { return "fopdt" } }} controller={{ form: "ideal", kc: 1 }} />', expect: 'refused' },
  { name: 'non-finite number', body: '<LoopResponse model={{ type: "fopdt", k: 1, tau: 1e999, theta: 0 }} controller={{ form: "ideal", kc: 1 }} />', expect: 'refused' },
  { name: 'regular expression literal', body: '<LoopResponse model={/x/} controller={{ form: "ideal", kc: 1 }} />', expect: 'refused' },
  { name: 'children inside a calculator', body: `<LoopResponse ${LOOP}><script>${PWN}</script></LoopResponse>`, expect: 'refused' },
  { name: 'calculator inline in text', body: `See <PidConverter controller={{ form: "ideal", kc: 1 }} /> here.`, expect: 'refused' },
  { name: 'calculator nested in a list', body: `- step one\n\n  <PidConverter controller={{ form: "ideal", kc: 1 }} />`, expect: 'refused' },
  { name: 'props that fail the calculator schema', body: '<Discretizer tf={{ num: [1], den: [1, 1] }} ts={-1} />', expect: 'refused' },
  // URLs
  { name: 'markdown javascript link', body: `[click](javascript:${PWN})`, expect: 'refused' },
  { name: 'mixed-case javascript link', body: '[click](JaVaScRiPt:alert(1))', expect: 'refused' },
  { name: 'entity-encoded javascript link', body: '[click](&#106;avascript:alert(1))', expect: 'refused' },
  { name: 'tab inside the scheme', body: '[click](java&#x09;script:alert(1))', expect: 'refused' },
  { name: 'percent-encoded scheme', body: '[click](java%09script:alert(1))', expect: 'refused' },
  { name: 'vbscript link', body: '[click](vbscript:msgbox(1))', expect: 'refused' },
  { name: 'data: HTML link', body: '[click](data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==)', expect: 'refused' },
  { name: 'reference definition with javascript', body: '[click][x]\n\n[x]: javascript:alert(1)', expect: 'refused' },
  { name: 'protocol-relative link', body: '[click](//evil.example/login)', expect: 'refused' },
  { name: 'image tracking pixel', body: '![chart](https://evil.example/pixel.png)', expect: 'refused' },
  { name: 'data: SVG image', body: '![x](data:image/svg+xml;base64,PHN2ZyBvbmxvYWQ9YWxlcnQoMSk+)', expect: 'refused' },
  { name: 'autolink with javascript', body: '<javascript:alert(1)>', expect: 'refused' },
  // Denial of service
  { name: 'ten thousand nested list markers', body: '- '.repeat(10_000) + 'x', expect: 'refused' },
  { name: 'deeply nested quotes', body: '> '.repeat(5_000) + 'x', expect: 'refused' },
  { name: 'body above the size cap', body: 'Steam trap survey notes. '.repeat(3_000), expect: 'refused' },
  { name: 'long emphasis-marker run', body: 'a* '.repeat(20_000), expect: 'refused' },
  // Inert: compiles, but nothing in it can run
  { name: 'entity-encoded script tag', body: `&#x3C;script&#x3E;${PWN}&#x3C;/script&#x3E;`, expect: 'inert' },
  { name: 'escaped braces', body: `\\{${PWN}\\}`, expect: 'inert' },
  { name: 'script in a code block', body: '```html\n<script>window.__pwned=1</script>\n```', expect: 'inert' },
  { name: 'handler in inline code', body: '`<img src=x onerror=alert(1)>`', expect: 'inert' },
  { name: 'link title with a handler', body: '[docs](https://example.org "onmouseover=alert(1)")', expect: 'inert' },
  { name: 'bare javascript text', body: 'Type javascript:alert(1) into nothing.', expect: 'inert' },
  { name: 'script in a calculator title string', body: `<LoopResponse ${LOOP} title="</div><script>${PWN}</script>" />`, expect: 'inert' },
  { name: 'quote-breaking calculator title', body: `<PidConverter controller={{ form: "ideal", kc: 1 }} title={"\\" onmouseover=\\"${PWN}"} />`, expect: 'inert' },
  { name: 'KaTeX href javascript', body: `$\\href{javascript:${PWN}}{click}$`, expect: 'inert' },
  { name: 'KaTeX url javascript', body: '$\\url{javascript:alert(1)}$', expect: 'inert' },
  { name: 'KaTeX htmlClass', body: '$\\htmlClass{fixed inset-0}{x}$', expect: 'inert' },
  { name: 'KaTeX htmlStyle', body: '$\\htmlStyle{position:fixed;background:url(javascript:alert(1))}{x}$', expect: 'inert' },
  { name: 'KaTeX htmlId and htmlData', body: '$\\htmlId{main}{x}\\htmlData{onclick=alert(1)}{y}$', expect: 'inert' },
  { name: 'KaTeX includegraphics', body: '$\\includegraphics{https://evil.example/x.png}$', expect: 'inert' },
  { name: 'KaTeX colour injection', body: '$\\color{red;background:url(https://evil.example/x)}{x}$', expect: 'inert' },
  { name: 'KaTeX macro bomb', body: '$$\n\\def\\x{\\x\\x}\\x\n$$', expect: 'inert' },
  { name: 'KaTeX huge rule', body: '$\\rule{100000em}{100000em}$', expect: 'inert' },
  { name: 'KaTeX gdef leaking between formulas', body: '$\\gdef\\tau{\\href{javascript:alert(1)}{t}}$ and $\\tau$', expect: 'inert' },
  { name: 'footnote with a prototype label', body: 'Note[^__proto__].\n\n[^__proto__]: constructor', expect: 'inert' },
];
