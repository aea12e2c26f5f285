/**
 * A direct renderer for the logic-free subset of handlebars that post templates use:
 * literal text, `{{this}}`, `{{name}}`, `{{@root.a.b}}`, `{{#each list}}…{{/each}}` over
 * arrays, and partials named statically or by `(lookup . "field")`. Each template is
 * parsed by Handlebars itself (whitespace control included) and turned into a closure
 * that concatenates strings, which avoids a frame, a context lookup and a helper call per
 * interpolation (on a 100,000-line program that is most of the rendering time).
 *
 * Anything outside the subset (other helpers, `else`, `../`, `@index`, hashes, partial
 * parameters) makes `compileDirect` return null; a value the subset cannot render the
 * way Handlebars would (a function, `each` over a non-array, a missing partial) makes the
 * renderer return null. In both cases the caller renders with Handlebars, so the output
 * is always what Handlebars gives (checked byte for byte in tests/unit/program).
 */
import Handlebars from 'handlebars';

type Node = hbs.AST.Statement;
type Path = hbs.AST.PathExpression;
/** Appends a template's output for one context to `out`; returns false to give up. */
type Emit = (ctx: unknown, root: unknown, out: Out) => boolean;
/** The output so far (one growing string: cheaper than an array joined at the end). */
interface Out { s: string }

/** Names Handlebars resolves as helpers before looking in the context (its built-ins). */
const HELPERS = new Set(['each', 'if', 'unless', 'with', 'log', 'lookup', 'helperMissing', 'blockHelperMissing']);

const own = Object.prototype.hasOwnProperty;
const prop = (o: unknown, k: string): unknown => (o != null && own.call(o, k) ? (o as Record<string, unknown>)[k] : undefined);

/** Handlebars' output of a value with escaping off: null/undefined → '', otherwise string conversion. */
const text = (v: unknown): string | null => (typeof v === 'function' ? null : v == null ? '' : String(v));

function valueOf(p: Path): ((ctx: unknown, root: unknown) => unknown) | null {
  if (p.depth !== 0) return null;
  if (p.data) {
    // @root.a.b: Handlebars chains data lookups with &&
    if (p.parts[0] !== 'root' || p.parts.length < 2) return null;
    const rest = p.parts.slice(1);
    return (_ctx, root) => {
      let v: unknown = root;
      for (const k of rest) v = v && prop(v, k);
      return v;
    };
  }
  if (p.parts.length === 0) return (ctx) => ctx;
  const [k] = p.parts;
  if (p.parts.length !== 1 || k === undefined || HELPERS.has(k)) return null;
  return (ctx) => prop(ctx, k);
}

interface Compiler { partial: (name: string) => Emit | null }

function compileBody(body: Node[], c: Compiler): Emit | null {
  const parts: Emit[] = [];
  for (const node of body) {
    const e = compileNode(node, c);
    if (!e) return null;
    parts.push(e);
  }
  return (ctx, root, out) => {
    for (const p of parts) if (!p(ctx, root, out)) return false;
    return true;
  };
}

function compileNode(node: Node, c: Compiler): Emit | null {
  switch (node.type) {
    case 'ContentStatement': {
      const v = (node as hbs.AST.ContentStatement).value;
      return (_c, _r, out) => { out.s += v; return true; };
    }
    case 'CommentStatement':
      return () => true;
    case 'MustacheStatement': {
      const m = node as hbs.AST.MustacheStatement;
      if (m.path.type !== 'PathExpression' || m.params.length > 0 || m.hash) return null;
      const get = valueOf(m.path as Path);
      if (!get) return null;
      return (ctx, root, out) => {
        const s = text(get(ctx, root));
        if (s === null) return false;
        out.s += s;
        return true;
      };
    }
    case 'BlockStatement': {
      const b = node as hbs.AST.BlockStatement;
      const [list] = b.params;
      if (b.path.original !== 'each' || b.params.length !== 1 || b.hash || b.inverse || list?.type !== 'PathExpression') return null;
      if ((b.program.blockParams ?? []).length > 0) return null;
      const get = valueOf(list as Path);
      const inner = compileBody(b.program.body, c);
      if (!get || !inner) return null;
      return (ctx, root, out) => {
        const items = get(ctx, root);
        if (items == null) return true;
        if (!Array.isArray(items)) return false;
        for (let i = 0; i < items.length; i++) if (i in items && !inner(items[i], root, out)) return false;
        return true;
      };
    }
    case 'PartialStatement': {
      const p = node as hbs.AST.PartialStatement;
      if (p.params.length > 0 || p.hash) return null;
      const indent = p.indent ?? '';
      const pre: Emit = (_c, _r, out) => { out.s += indent; return true; };
      if (p.name.type === 'PathExpression') {
        const e = c.partial((p.name as Path).original);
        return e && ((ctx, root, out) => pre(ctx, root, out) && e(ctx, root, out));
      }
      // (lookup . "field"): the partial named by a field of the context
      const s = p.name as hbs.AST.SubExpression;
      const [target, field] = s.params;
      if (s.path.original !== 'lookup' || s.params.length !== 2 || s.hash || target?.type !== 'PathExpression' || (target as Path).parts.length !== 0
        || (target as Path).depth !== 0 || (target as Path).data || field?.type !== 'StringLiteral') return null;
      const key = (field as hbs.AST.StringLiteral).value;
      return (ctx, root, out) => {
        const name = prop(ctx, key);
        const e = typeof name === 'string' ? c.partial(name) : null;
        return e !== null && pre(ctx, root, out) && e(ctx, root, out);
      };
    }
    default:
      return null;
  }
}

/**
 * The direct renderer of a main template and its partials, or null when a template uses
 * anything outside the subset. The renderer returns null when a value needs Handlebars.
 */
export function compileDirect(main: string, partials: Record<string, string>): ((view: unknown) => string | null) | null {
  const compiled = new Map<string, Emit | null>();
  const sources = new Map(Object.entries(partials));
  let unsupported = false;
  const c: Compiler = {
    partial(name) {
      if (!sources.has(name)) return null;
      if (!compiled.has(name)) {
        compiled.set(name, null); // a recursive partial is outside the subset
        const e = compileBody(Handlebars.parse(sources.get(name) as string).body, c);
        if (!e) unsupported = true;
        compiled.set(name, e);
      }
      return compiled.get(name) ?? null;
    },
  };
  // compile every partial up front, so a partial reached only through `lookup` is checked too
  for (const name of sources.keys()) c.partial(name);
  const root = compileBody(Handlebars.parse(main).body, c);
  if (!root || unsupported) return null;
  return (view) => {
    const out: Out = { s: '' };
    return root(view, view, out) ? out.s : null;
  };
}
