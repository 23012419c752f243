// Request bodies come from the one contract (@waymark/contract).
export { loginBody as loginSchema, passwordChangeBody as passwordChangeSchema } from "@waymark/contract";
