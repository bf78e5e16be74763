/** RFC 9457 problem details, as every API error answers (application/problem+json). */
export interface Problem {
  type: string;
  title: string;
  status: number;
  detail?: string;
  code: string;
  /** Field path → messages, for 400s. */
  errors?: Record<string, string[]>;
  requestId?: string;
  currentVersion?: number | null;
  current?: unknown;
}
