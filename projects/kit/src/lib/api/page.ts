/** One page of a list endpoint. */
export interface Page<T> {
  items: T[];
  total: number;
  limit: number;
  offset: number;
}

/** Paging, sorting and text filter of a list endpoint (`sort` is a field, `-field` for descending). */
export interface ListQuery {
  q: string;
  sort: string;
  offset: number;
  limit: number;
}
