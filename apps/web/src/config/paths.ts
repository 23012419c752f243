/** Every route path of the web app, in one place. */
export const paths = {
  signIn: "/sign-in",
  home: "/",
} as const;
