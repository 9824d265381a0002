export function pagePolicy(options?: { nonce?: string; development?: boolean; https?: boolean }): string;
export const API_POLICY: string;
export function commonHeaders(options?: { https?: boolean }): { key: string; value: string }[];
export function servesHttps(url: string | undefined): boolean;
export const NONCE_PAGE_PREFIXES: string[];
export function headerRules(options?: { development?: boolean; https?: boolean }): { source: string; headers: { key: string; value: string }[] }[];
