// Multipart fields of an upload, from the one contract (@waymark/contract).
export { columnChoiceBody as columnChoiceSchema } from "@waymark/contract";
