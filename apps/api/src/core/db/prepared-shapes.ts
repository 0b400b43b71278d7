/**
 * Prepared statements kept by the shape of their SQL. A list query with optional filters
 * has a handful of shapes (which filters are present, sort, direction); each is built and
 * prepared once with `sql.placeholder`s, and a request only binds its values. Building the SQL
 * and re-preparing it cost more than running the query on a 10,000-job shop.
 */
export class PreparedShapes<Q> {
  private readonly byShape = new Map<string, Q>();

  /** `max` bounds memory should shapes ever multiply; the oldest-built is dropped first. */
  constructor(private readonly max = 128) {}

  get(shape: string, build: () => Q): Q {
    const known = this.byShape.get(shape);
    if (known) return known;
    const made = build();
    if (this.byShape.size >= this.max) this.byShape.delete(this.byShape.keys().next().value as string);
    this.byShape.set(shape, made);
    return made;
  }
}

type Values = Record<string, unknown>;

/** The two statements of a paged list: the matching total, and one page of rows. */
export interface PagedStatements<Row> {
  total: () => { get(values: Values): { n: number } | undefined };
  page: () => { all(values: Values): Row[] };
}

/** A paged list prepared per shape: the total first, and the page only when something matches. */
export class PreparedPages<Row> {
  private readonly totals = new PreparedShapes<ReturnType<PagedStatements<Row>['total']>>();
  private readonly pages = new PreparedShapes<ReturnType<PagedStatements<Row>['page']>>();

  run(shape: string, values: Values, build: PagedStatements<Row>): { rows: Row[]; total: number } {
    const total = this.totals.get(shape, build.total).get(values)?.n ?? 0;
    return { rows: total === 0 ? [] : this.pages.get(shape, build.page).all(values), total };
  }
}
