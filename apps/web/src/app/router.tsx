import { createBrowserRouter } from "react-router-dom";
import { paths } from "@/config/paths";
import { RequireUser } from "./require-user";
import { HomeRoute } from "./routes/home";
import { NotFoundRoute } from "./routes/not-found";
import { SignInRoute } from "./routes/sign-in";

export function createRouter() {
  return createBrowserRouter([
    { path: paths.signIn, element: <SignInRoute /> },
    {
      element: <RequireUser />,
      children: [{ path: paths.home, element: <HomeRoute /> }],
    },
    { path: "*", element: <NotFoundRoute /> },
  ]);
}
