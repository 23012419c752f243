export function ErrorPanel({ title = "Something went wrong", message }: { title?: string; message: string }) {
  return (
    <div role="alert" className="rounded-md border border-brick/40 bg-brick-100 p-4 text-ink">
      <p className="font-semibold text-brick">{title}</p>
      <p className="mt-1 text-sm">{message}</p>
    </div>
  );
}
