// Request bodies from the one contract (@waymark/contract).
export {
  approveBody as approveSchema,
  requestChangesBody as requestChangesSchema,
  submitBody as submitSchema,
} from "@waymark/contract";
