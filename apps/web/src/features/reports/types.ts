/** The report as the API sends it for the preview: the same blocks the DOCX is built from. */
export interface Run {
  text: string;
  italic?: boolean;
  bold?: boolean;
}

export type Block =
  | { type: "heading"; level: 1 | 2 | 3; text: string }
  | { type: "paragraph"; runs: Run[]; section?: string }
  | { type: "table"; caption: string; header: string[]; rows: string[][] }
  | { type: "figure"; caption: string; image?: string; figure?: string }
  | { type: "caution"; text: string }
  | { type: "references"; items: string[] };

export interface ReportPreview {
  report: { blocks: Block[] };
  approved: boolean;
  draft?: boolean;
}

export interface ReportExport {
  id: number;
  at: string;
  actorEmail: string | null;
  draft: boolean;
}

export interface ApprovedStudy {
  id: number;
  title: string;
  status: "draft" | "in_review" | "approved";
  owner: { id: number; displayName: string } | null;
  outcomeName: string;
  levels: string[];
  updatedAt: string;
}
