/**
 * docs/report.schema.json, the JSON Schema (draft 2020-12) of report.json,
 * generated from the `Report` type in packages/cli/src/outputs/report.ts:
 * `npx -y pnpm@10.34.9 report-schema`. test/reportSchema.test.ts checks that
 * the committed file equals a fresh one and validates builds against it.
 *
 * The TypeScript checker resolves every type to its structure (the spec's
 * type is inferred from its zod schema, the sections are interfaces), and
 * this walk turns that structure into JSON Schema: objects with every
 * property (required unless optional, no others allowed), arrays and tuples,
 * string/number/boolean and literal unions, unions of objects as `anyOf`
 * (the polar and the planar report); each property's doc comment becomes its
 * description. A named object type used more than once (the spec, a cut
 * file's section) is written once under `$defs` and referred to by `$ref`.
 */
import { writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import ts from 'typescript';

const ROOT = resolve(import.meta.dirname, '..');
export const REPORT_SCHEMA_PATH = join(ROOT, 'docs/report.schema.json');
const REPORT_TYPES = join(ROOT, 'packages/cli/src/outputs/report.ts');

type Schema = Record<string, unknown>;

/** The JSON Schema of report.json as text (stable key order, two-space indent, final newline). */
export function reportSchemaText(): string {
  const program = ts.createProgram([REPORT_TYPES], {
    strict: true,
    module: ts.ModuleKind.Preserve,
    moduleResolution: ts.ModuleResolutionKind.Bundler,
    target: ts.ScriptTarget.ES2022,
    allowImportingTsExtensions: true,
    noEmit: true,
    skipLibCheck: true,
  });
  const checker = program.getTypeChecker();
  const source = program.getSourceFile(REPORT_TYPES);
  if (!source) throw new Error(`cannot read ${REPORT_TYPES}`);
  const alias = source.statements.find((s): s is ts.TypeAliasDeclaration => ts.isTypeAliasDeclaration(s) && s.name.text === 'Report');
  if (!alias) throw new Error('report.ts declares no type Report');
  const type = checker.getTypeAtLocation(alias.name);
  // First walk: which named object types occur more than once (the polar and planar reports share the spec, cut sections, …).
  const uses = new Map<ts.Type, number>();
  toSchema({ checker, uses }, type, new Set(), 'report');
  const shared = new Map<ts.Type, string>();
  for (const [t, n] of uses) if (n > 1) shared.set(t, defName(checker, t, shared));
  const walk = { checker, shared, defs: {} as Record<string, Schema> };
  const root = toSchema(walk, type, new Set(), 'report');
  const schema: Schema = {
    $schema: 'https://json-schema.org/draft/2020-12/schema',
    title: 'umbrafab report.json',
    description: docOf(checker, checker.getSymbolAtLocation(alias.name)),
    ...root,
    ...(Object.keys(walk.defs).length ? { $defs: Object.fromEntries(Object.entries(walk.defs).sort(([a], [b]) => a.localeCompare(b))) } : {}),
  };
  return `${JSON.stringify(schema, null, 2)}\n`;
}

/**
 * One walk over the type: counting named object types (`uses`), or writing
 * the schema with the `shared` ones (used more than once) as `$ref`s into
 * `defs`, each written once.
 */
type Walk =
  | { readonly checker: ts.TypeChecker; readonly uses: Map<ts.Type, number> }
  | { readonly checker: ts.TypeChecker; readonly shared: ReadonlyMap<ts.Type, string>; readonly defs: Record<string, Schema> };

/** An interface's or type alias's name, for a shared type's `$defs` entry (made unique). */
function defName(checker: ts.TypeChecker, type: ts.Type, taken: ReadonlyMap<ts.Type, string>): string {
  const base = (type.aliasSymbol ?? type.getSymbol())?.getName().replace(/^__\w+$/, '') || checker.typeToString(type).replace(/\W+/g, '') || 'object';
  const names = new Set(taken.values());
  let name = base;
  for (let i = 2; names.has(name); i++) name = `${base}${i}`;
  return name;
}

function isNamedObject(type: ts.Type): boolean {
  const name = (type.aliasSymbol ?? type.getSymbol())?.getName();
  return name !== undefined && !name.startsWith('__') && name !== 'Array' && name !== 'ReadonlyArray';
}

function toSchema(walk: Walk, type: ts.Type, seen: ReadonlySet<ts.Type>, where: string): Schema {
  const checker = walk.checker;
  const f = type.flags;
  if (f & ts.TypeFlags.Any || f & ts.TypeFlags.Unknown) return {};
  if (f & ts.TypeFlags.StringLiteral) return { const: (type as ts.StringLiteralType).value };
  if (f & ts.TypeFlags.NumberLiteral) return { const: (type as ts.NumberLiteralType).value };
  if (f & ts.TypeFlags.BooleanLiteral) return { const: checker.typeToString(type) === 'true' };
  if (f & ts.TypeFlags.String) return { type: 'string' };
  if (f & ts.TypeFlags.Number) return { type: 'number' };
  if (f & ts.TypeFlags.Boolean) return { type: 'boolean' };
  if (f & ts.TypeFlags.Null) return { type: 'null' };
  if (type.isUnion()) {
    const parts = type.types.filter((t) => !(t.flags & ts.TypeFlags.Undefined));
    if (parts.every((t) => t.flags & ts.TypeFlags.BooleanLiteral)) return { type: 'boolean' };
    if (parts.length === 1) return toSchema(walk, parts[0], seen, where);
    if (parts.every((t) => t.isStringLiteral())) return { enum: parts.map((t) => (t as ts.StringLiteralType).value) };
    return { anyOf: parts.map((t) => toSchema(walk, t, seen, where)) };
  }
  if (seen.has(type)) throw new Error(`${where}: a recursive type cannot be written as a plain schema`);
  const inner = new Set(seen).add(type);
  if (checker.isTupleType(type)) {
    const items = checker.getTypeArguments(type as ts.TypeReference).map((t, i) => toSchema(walk, t, inner, `${where}[${i}]`));
    return { type: 'array', prefixItems: items, minItems: items.length, maxItems: items.length };
  }
  if (checker.isArrayType(type)) {
    const [item] = checker.getTypeArguments(type as ts.TypeReference);
    return { type: 'array', items: toSchema(walk, item, inner, `${where}[]`) };
  }
  if (f & ts.TypeFlags.Object || type.isIntersection()) {
    if ('uses' in walk && isNamedObject(type)) {
      const n = walk.uses.get(type) ?? 0;
      walk.uses.set(type, n + 1);
      if (n > 0) return {};
    }
    const shared = 'shared' in walk ? walk.shared.get(type) : undefined;
    if (shared !== undefined && 'defs' in walk) {
      if (!(shared in walk.defs)) {
        walk.defs[shared] = {};
        walk.defs[shared] = objectSchema(walk, type, inner, where);
      }
      return { $ref: `#/$defs/${shared}` };
    }
    return objectSchema(walk, type, inner, where);
  }
  throw new Error(`${where}: no JSON Schema for the type ${checker.typeToString(type)}`);
}

/** An object: every property (required unless optional, described by its doc comment), no others; or a map of one value type. */
function objectSchema(walk: Walk, type: ts.Type, inner: ReadonlySet<ts.Type>, where: string): Schema {
  const checker = walk.checker;
  const properties: Record<string, Schema> = {};
  const required: string[] = [];
  for (const p of checker.getPropertiesOfType(type)) {
    const decl = p.valueDeclaration ?? p.declarations?.[0];
    const pt = decl ? checker.getTypeOfSymbolAtLocation(p, decl) : checker.getTypeOfSymbol(p);
    const description = docOf(checker, p);
    properties[p.name] = { ...(description ? { description } : {}), ...toSchema(walk, pt, inner, `${where}.${p.name}`) };
    if (!(p.flags & ts.SymbolFlags.Optional)) required.push(p.name);
  }
  const index = checker.getIndexInfosOfType(type);
  if (index.length > 0 && Object.keys(properties).length === 0) {
    return { type: 'object', additionalProperties: toSchema(walk, index[0].type, inner, `${where}[key]`) };
  }
  return { type: 'object', properties, required, additionalProperties: false };
}

function docOf(checker: ts.TypeChecker, symbol: ts.Symbol | undefined): string {
  if (!symbol) return '';
  return ts.displayPartsToString(symbol.getDocumentationComment(checker)).replace(/\s+/g, ' ').trim();
}

if (process.argv[1] && resolve(process.argv[1]) === resolve(import.meta.filename)) {
  writeFileSync(REPORT_SCHEMA_PATH, reportSchemaText());
  console.log(`report-schema: wrote ${REPORT_SCHEMA_PATH}`);
}
