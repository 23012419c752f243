// Request bodies for studies come from the one contract (@waymark/contract); the names here are
// the ones the routes and the service already use.
export {
  alpha as alphaSchema,
  createStudyBody as createStudySchema,
  designBody as designSchema,
  planBody as planSchema,
  studyFields,
  updateStudyBody as updateStudySchema,
} from "@waymark/contract";
