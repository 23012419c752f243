import { zodResolver } from "@hookform/resolvers/zod";
import type { ReactNode } from "react";
import {
  useForm,
  type DefaultValues,
  type FieldValues,
  type Resolver,
  type UseFormReturn,
} from "react-hook-form";
import type { z } from "zod";

interface FormProps<TValues extends FieldValues> {
  schema: z.ZodType<TValues, TValues>;
  defaultValues?: DefaultValues<TValues>;
  onSubmit: (values: TValues, form: UseFormReturn<TValues>) => void | Promise<void>;
  children: (form: UseFormReturn<TValues>) => ReactNode;
  className?: string;
  "aria-label"?: string;
}

/** The one form wrapper: react-hook-form validated by a zod schema. */
export function Form<TValues extends FieldValues>({
  schema,
  defaultValues,
  onSubmit,
  children,
  className,
  ...rest
}: FormProps<TValues>) {
  const form = useForm<TValues>({
    resolver: zodResolver(schema) as unknown as Resolver<TValues>,
    defaultValues,
  });
  return (
    <form
      noValidate
      className={className}
      aria-label={rest["aria-label"]}
      onSubmit={form.handleSubmit((v) => onSubmit(v, form))}
    >
      {children(form)}
    </form>
  );
}
