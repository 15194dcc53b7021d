"use client";
import { startTransition, type FormEvent } from "react";

/**
 * conform `onSubmit` that calls the server action inside a transition instead
 * of letting React submit the form natively. React 19 resets a natively
 * submitted form after its action, which would wipe what the person typed
 * when the server answers with errors; this keeps the input. Without
 * JavaScript the form still posts to the same action.
 */
export function submitKeepingInput(formAction: (formData: FormData) => void) {
  return (event: FormEvent<HTMLFormElement>, context: { formData: FormData }) => {
    event.preventDefault();
    startTransition(() => formAction(context.formData));
  };
}
