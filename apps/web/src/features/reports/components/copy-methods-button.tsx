import { ClipboardCopy } from "lucide-react";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { methodsText } from "../report-text";
import type { Block } from "@waymark/contract";

/** Copies the text of the Methods part as plain text, for pasting into a manuscript. */
export function CopyMethodsButton({ blocks }: { blocks: Block[] }) {
  const [state, setState] = useState<"idle" | "copied" | "failed">("idle");
  const text = methodsText(blocks);
  const copy = async () => {
    if (!text) return;
    try {
      await navigator.clipboard.writeText(text);
      setState("copied");
    } catch {
      setState("failed");
    }
  };
  return (
    <span className="inline-flex items-center gap-2">
      <Button variant="secondary" onClick={copy} disabled={!text}>
        <ClipboardCopy aria-hidden="true" className="h-4 w-4" /> Copy methods as plain text
      </Button>
      <span role="status" className="text-sm">
        {state === "copied"
          ? "Copied."
          : state === "failed"
            ? "The browser did not allow copying; select the text instead."
            : ""}
      </span>
    </span>
  );
}
