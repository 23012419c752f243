import { Button } from "@/components/ui/button";
import { Form } from "@/components/ui/form";
import { TextField } from "@/components/ui/text-field";
import { ErrorPanel } from "@/components/errors/error-panel";
import { loginInputSchema, useLogin } from "../api/login";

export function SignInForm({ onSignedIn, prefillEmail }: { onSignedIn: () => void; prefillEmail?: string }) {
  const login = useLogin();
  return (
    <Form
      key={prefillEmail}
      schema={loginInputSchema}
      defaultValues={{ email: prefillEmail ?? "", password: "" }}
      aria-label="Sign in"
      className="flex flex-col gap-4"
      onSubmit={(values) => login.mutate(values, { onSuccess: onSignedIn })}
    >
      {({ register, formState }) => (
        <>
          <TextField
            label="E-mail"
            type="email"
            autoComplete="username"
            error={formState.errors.email?.message}
            {...register("email")}
          />
          <TextField
            label="Password"
            type="password"
            autoComplete="current-password"
            error={formState.errors.password?.message}
            {...register("password")}
          />
          {login.error && <ErrorPanel title="Could not sign in" message={login.error.message} />}
          <Button type="submit" disabled={login.isPending}>
            {login.isPending ? "Signing in…" : "Sign in"}
          </Button>
        </>
      )}
    </Form>
  );
}
