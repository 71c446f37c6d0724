import { fileURLToPath } from 'node:url';
import ts from 'typescript';

/** What server/db/schema.ts says about one column: whether its selected value may be null, when the type says. */
export interface TypedColumn {
  table: string;
  column: string;
  /** null when the type is `unknown` or `any`, which says nothing about null. */
  nullable: boolean | null;
}

const schemaFile = fileURLToPath(new URL('../../../server/db/schema.ts', import.meta.url));

/**
 * Every column of the `Database` interface, read with the TypeScript checker rather than a regex so that
 * `extends`, aliases (`type BasinsTable = ChairsTable`) and Kysely's ColumnType/Generated wrappers resolve
 * exactly as the compiler resolves them for the repositories.
 */
export function typedColumns(): TypedColumn[] {
  const program = ts.createProgram([schemaFile], {
    strict: true, // without strictNullChecks the checker drops `| null` from every union
    target: ts.ScriptTarget.ES2022,
    module: ts.ModuleKind.ESNext,
    moduleResolution: ts.ModuleResolutionKind.Bundler,
    skipLibCheck: true,
    noEmit: true,
    types: [],
  });
  const checker = program.getTypeChecker();
  const source = program.getSourceFile(schemaFile);
  if (!source) throw new Error(`cannot read ${schemaFile}`);
  const database = source.statements.find((s): s is ts.InterfaceDeclaration => ts.isInterfaceDeclaration(s) && s.name.text === 'Database');
  if (!database) throw new Error('server/db/schema.ts has no `interface Database`');

  const columns: TypedColumn[] = [];
  for (const table of checker.getPropertiesOfType(checker.getTypeAtLocation(database))) {
    for (const column of checker.getPropertiesOfType(checker.getTypeOfSymbol(table))) {
      columns.push({ table: table.name, column: column.name, nullable: selectsNull(checker, checker.getTypeOfSymbol(column)) });
    }
  }
  return columns;
}

/**
 * Whether a column's selected value may be null. Kysely's ColumnType<S, I, U> (and Generated<S>, Json…) is an
 * object whose `__select__` property holds S; a union such as `Timestamp | null` is read member by member, as
 * Kysely's own SelectType does.
 */
function selectsNull(checker: ts.TypeChecker, type: ts.Type): boolean | null {
  let nullable = false;
  let unsaid = false;
  for (const member of type.isUnion() ? type.types : [type]) {
    const selected = member.getProperty('__select__');
    const inner = selected ? selectsNull(checker, checker.getTypeOfSymbol(selected)) : null;
    if (selected) {
      if (inner === null) unsaid = true;
      else nullable ||= inner;
    } else if (member.flags & ts.TypeFlags.Null) nullable = true;
    else if (member.flags & (ts.TypeFlags.Unknown | ts.TypeFlags.Any)) unsaid = true;
  }
  return nullable ? true : unsaid ? null : false;
}
