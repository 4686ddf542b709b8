import { Link, type LinkProps } from "react-router";

/** A link that looks and sizes like a big answer button (at least 56 px tall). */
export function ButtonLink({ className = "", ...props }: LinkProps) {
  return (
    <Link {...props} className={`flex min-h-14 items-center justify-center rounded-md bg-go px-4 text-lg font-bold text-white no-underline ${className}`} />
  );
}
