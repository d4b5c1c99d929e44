// The words Baywright retired stay retired. Reads the text people see — string literals, template
// text and JSX text of app/, components/, server/mail, lib/sheet and the messages of lib/checks and
// lib/planning — and fails on any retired word (DESIGN.md's "Retired" paragraph, issue 13's list,
// the glossary in DEVELOPERS.md). Class names, test ids, imports, type literals, object keys and
// comparisons are data, not words, and are skipped; `pass`/`warn`/`fail` in lower case are data ids.
import fs from 'node:fs';
import path from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

const ROOT = path.join(__dirname, '..', '..');
const SCOPES = ['app', 'components', 'server/mail', 'lib/sheet', 'lib/checks', 'lib/planning'];
/** Attributes whose values are for code, not for people. */
const CODE_ATTRIBUTES = /^(className|key|id|type|role|href|src|name|htmlFor|value|method|action|target|rel|autoComplete|inputMode|accept|form|lang|dir|data-.*|sizes|pattern|step|encType|as|fill|stroke|fontFamily|textAnchor|strokeDasharray|transform|d|viewBox|points|preserveAspectRatio)$/;

interface Said { file: string; line: number; text: string }

function filesUnder(dir: string): string[] {
  const full = path.join(ROOT, dir);
  if (!fs.existsSync(full)) return [];
  return fs.readdirSync(full, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile() && /\.(ts|tsx)$/.test(e.name) && !e.name.endsWith('.d.ts'))
    .map((e) => path.relative(ROOT, path.join(e.parentPath, e.name)));
}

function isData(node: ts.Node): boolean {
  const p = node.parent;
  if (!p) return false;
  if (ts.isImportDeclaration(p) || ts.isExportDeclaration(p) || ts.isExternalModuleReference(p) || ts.isImportTypeNode(p.parent ?? p)) return true;
  if (ts.isLiteralTypeNode(p)) return true;
  if (ts.isPropertyAssignment(p) && p.name === node) return true;
  if (ts.isPropertySignature(p) || ts.isEnumMember(p)) return true;
  if (ts.isElementAccessExpression(p) && p.argumentExpression === node) return true;
  if (ts.isCaseClause(p)) return true;
  if (ts.isBinaryExpression(p) && [ts.SyntaxKind.EqualsEqualsEqualsToken, ts.SyntaxKind.ExclamationEqualsEqualsToken, ts.SyntaxKind.EqualsEqualsToken, ts.SyntaxKind.ExclamationEqualsToken, ts.SyntaxKind.InKeyword].includes(p.operatorToken.kind)) return true;
  if (ts.isJsxAttribute(p) && CODE_ATTRIBUTES.test(p.name.getText())) return true;
  if (ts.isJsxExpression(p) && p.parent && ts.isJsxAttribute(p.parent) && CODE_ATTRIBUTES.test(p.parent.name.getText())) return true;
  // Arguments of calls that take code, not words.
  if (ts.isCallExpression(p)) {
    const callee = p.expression.getText();
    if (/^(r|[\w.]*register|[\w.]*watch|[\w.]*setValue|[\w.]*getValues|[\w.]*getFieldState|require|import|console\.\w+|[\w.]*startsWith|[\w.]*endsWith|[\w.]*includes|[\w.]*getAttr|[\w.]*setAttr|[\w.]*querySelector\w*|[\w.]*getByTestId|[\w.]*addEventListener|[\w.]*removeEventListener|[\w.]*get|[\w.]*set|[\w.]*has|[\w.]*delete|[\w.]*setHeader|headers\.\w+|[\w.]*searchParams\.\w+|PDFName\.of|z\.\w+|[\w.]*split|[\w.]*join|[\w.]*replace\w*)$/.test(callee)) return true;
  }
  return false;
}

function saidIn(file: string): Said[] {
  const text = fs.readFileSync(path.join(ROOT, file), 'utf8');
  const src = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true, file.endsWith('.tsx') ? ts.ScriptKind.TSX : ts.ScriptKind.TS);
  const out: Said[] = [];
  const add = (node: ts.Node, s: string) => {
    if (s.trim()) out.push({ file, line: src.getLineAndCharacterOfPosition(node.getStart()).line + 1, text: s });
  };
  const walk = (node: ts.Node) => {
    if ((ts.isStringLiteral(node) || ts.isNoSubstitutionTemplateLiteral(node)) && !isData(node)) add(node, node.text);
    else if (ts.isTemplateExpression(node) && !isData(node)) {
      add(node, [node.head.text, ...node.templateSpans.map((s) => s.literal.text)].join(' … '));
    } else if (ts.isJsxText(node)) add(node, node.text);
    ts.forEachChild(node, walk);
  };
  walk(src);
  return out;
}

interface Retired {
  what: string;
  pattern: RegExp;
  /** Files where the pattern is a legitimate use (data ids, a name the user typed). */
  allow?: RegExp;
}

const RETIRED: Retired[] = [
  // Status words: one vocabulary (lib/checks/words.ts); pass/warn/fail are data ids only.
  { what: 'PASS/WARN/FAIL as display words', pattern: /\b(PASS|WARN|FAIL|Pass|Warn|Fail)\b/ },
  { what: 'OK/CHECK/NOT KNOWN as status words', pattern: /\b(NOT KNOWN|CHECK)\b|(^|[\s·:])OK($|[\s·.])/ },
  { what: '"failing / to watch" counts', pattern: /\b(\d+ failing|to watch|passing\b)/ },
  // Rule ids and JSON paths never reach people.
  { what: 'a rule id printed as a code', pattern: /\b(fit|walkway|headroom|sleep|travel|egress|mass|power|water|gas|heat|clearance)\.[a-z][a-z-]+[a-z]\b/, allow: /^lib\/(checks|planning)\// },
  { what: 'a JSON path', pattern: /\b(systems|bay|occupants|buildUp|settings)\.[a-z]+[A-Z]?\w*\b/ , allow: /^lib\/(checks|planning)\// },
  { what: 'a rule id or JSON path in a check message', pattern: /\b(systems\.[a-z]+\.\w+|fittedMm2|installerCertified)\b/ },
  // Programs, libraries and calculators named as sources.
  { what: 'a program or library named in the interface', pattern: /\b(PVWatts|PVGIS|pvlib|pdf-lib|fontkit|Konva|zustand|Drizzle|PGlite|nodemailer|convert-units)\b/, allow: /^lib\/(checks|planning)\// },
  { what: 'a program, library or shop named in a check message', pattern: /\b(PVWatts|PVGIS|pvlib|convert-units|Better Sleep Council|IKEA|Amazon)\b|as cited in the brief/i },
  // Words of other programs (the mark-ups, states, overlay, steps, tracing, file menu and conflict renames).
  { what: 'comment pins and resolving', pattern: /\b(comment pins?|pin(ned)? a comment|Pin comment|Add a comment)\b/i },
  { what: 'resolve / resolved', pattern: /\b(resolve[sd]?|resolving)\b/i },
  { what: 'ghost / onion skin', pattern: /\b(ghost(ed)?|onion[- ]?skin)\b/i },
  { what: 'snap', pattern: /\bsnap(ping|s)?\b/i },
  { what: 'calibrate', pattern: /\bcalibrat(e|ed|ion|ing)\b/i },
  { what: 'working copy', pattern: /\bworking copy\b/i },
  { what: 'revoke', pattern: /\brevok(e|ed|es|ing)\b/i },
  { what: 'reload theirs / keep mine', pattern: /\b(reload theirs|keep mine|load theirs|drop my changes)\b/i },
  { what: 'review-platform states', pattern: /\b(Changes asked|Ask for changes)\b/ },
  { what: 'format names as file commands', pattern: /\b(Export|Import) (PNG|JSON)\b/ },
];

const said = SCOPES.flatMap(filesUnder).flatMap(saidIn);

describe('retired words', () => {
  it('reads a real amount of interface text', () => {
    expect(said.length).toBeGreaterThan(1500);
    expect(said.some((s) => s.text.includes('Parts shelf') || s.text.includes('Checks'))).toBe(true);
  });

  for (const r of RETIRED) {
    const hits = () => said.filter((s) => r.pattern.test(s.text) && !(r.allow && r.allow.test(s.file))).map((s) => `${s.file}:${s.line}: ${s.text.slice(0, 120)}`);
    it(`never shows ${r.what}`, () => expect(hits()).toEqual([]));
  }

  it('catches a retired word when one is put back', () => {
    const sample: Said[] = [{ file: 'components/x.tsx', line: 1, text: '2 Pass, 1 FAIL' }, { file: 'components/x.tsx', line: 2, text: 'walkway.width' }];
    expect(RETIRED.filter((r) => sample.some((s) => r.pattern.test(s.text))).map((r) => r.what)).toEqual([
      'PASS/WARN/FAIL as display words', 'a rule id printed as a code',
    ]);
  });
});
