// Request body from the one contract (@waymark/contract).
export { powerBody as powerSchema } from "@waymark/contract";
