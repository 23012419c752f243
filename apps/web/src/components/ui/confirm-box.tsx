import { useId, type ReactNode } from "react";
import { Button } from "./button";

/** The second step of an action that cannot be taken back: what it does, then yes or not yet. */
export function ConfirmBox({
  title,
  children,
  confirmLabel,
  pendingLabel,
  pending,
  onConfirm,
  onCancel,
}: {
  title: string;
  children: ReactNode;
  confirmLabel: string;
  pendingLabel: string;
  pending: boolean;
  onConfirm: () => void;
  onCancel: () => void;
}) {
  const id = useId();
  return (
    <div
      role="alertdialog"
      aria-labelledby={`${id}-title`}
      aria-describedby={`${id}-text`}
      className="mt-3 rounded-md border-l-4 border-amber bg-amber-100 p-4"
    >
      <p id={`${id}-title`} className="font-semibold">
        {title}
      </p>
      <p id={`${id}-text`} className="mt-1 max-w-prose text-sm">
        {children}
      </p>
      <div className="mt-3 flex gap-2">
        <Button disabled={pending} onClick={onConfirm}>
          {pending ? pendingLabel : confirmLabel}
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Not yet
        </Button>
      </div>
    </div>
  );
}
