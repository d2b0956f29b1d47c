export const FIRST_ROUTE_BUDGET_BYTES: number;
export const ROUTE_MODULES: Record<string, string>;
export function routeJs(
  distDir: string,
  routeModule: string,
): { files: string[]; gzipBytes: number };
export function routeJsReport(distDir: string): string;
