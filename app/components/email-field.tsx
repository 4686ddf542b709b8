/** The e-mail a person signs in with, on the sign-in and forgot-password pages; its error is announced with it. */
export function EmailField({ error, defaultValue }: { error?: string | null; defaultValue?: string }) {
  return (
    <div>
      <label htmlFor="email" className="block font-bold">
        E-mail
      </label>
      <input
        id="email"
        name="email"
        type="email"
        autoComplete="username"
        defaultValue={defaultValue}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? "email-error" : undefined}
        className="mt-1 block min-h-14 w-full rounded-md border-2 border-ink px-3 text-lg"
      />
      {error ? (
        <p id="email-error" className="mt-1 font-bold text-stop">
          {error}
        </p>
      ) : null}
    </div>
  );
}
