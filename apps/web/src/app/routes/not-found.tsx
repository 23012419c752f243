import { Link } from "react-router-dom";
import { paths } from "@/config/paths";

export function NotFoundRoute() {
  return (
    <main className="mx-auto max-w-xl px-4 py-24 text-center">
      <p className="num text-sm text-ink-soft">404</p>
      <h1 className="mt-2 text-3xl font-semibold text-spruce">This trail has no marker here</h1>
      <p className="mt-3">The page you asked for does not exist, or it moved.</p>
      <p className="mt-6">
        <Link to={paths.home}>Back to your home page</Link>
      </p>
    </main>
  );
}
