/** Filled in with the console: time from clicking a module to its element rendered. */
export interface ModuleTiming {
  module: string;
  firstVisitMs: number;
  returnVisitMs: number;
}

export async function moduleTimings(_baseUrl: string): Promise<ModuleTiming[]> {
  return [];
}
