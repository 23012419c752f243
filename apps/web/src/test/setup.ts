import { cleanup, configure } from "@testing-library/react";
import { afterEach } from "vitest";

// findBy/waitFor wait up to 5 s: a loaded CI machine renders slower than the 1 s default allows.
configure({ asyncUtilTimeout: 5000 });

afterEach(() => cleanup());
