// Entry point of the worker threads: piscina calls these named exports.
export { analyzeTask, extractTask, previewTask } from "./tasks.js";
