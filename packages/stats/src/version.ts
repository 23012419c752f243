/** Engine version reported in every result, so a stored analysis says which code produced it. */
export const ENGINE_VERSION = "0.1.0";
