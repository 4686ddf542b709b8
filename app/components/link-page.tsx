import { Link } from "react-router";
import { ErrorList } from "~/components/ui/error-list";

/** The page an e-mailed link opens, outside the app's menu: why it cannot be used, or what it is for. */
export function LinkPage({
  message,
  usable,
  otherwise,
  children,
}: {
  message: string | null;
  usable: boolean;
  otherwise: { to: string; label: string };
  children: React.ReactNode;
}) {
  return (
    <main className="mx-auto max-w-md px-4 py-8">
      <h1 className="text-3xl font-bold">Tankside</h1>
      {message ? (
        <div className="mt-4">
          <ErrorList error={message} />
        </div>
      ) : null}
      {usable && !message ? (
        children
      ) : (
        <p className="mt-4">
          <Link to={otherwise.to} className="font-bold underline">
            {otherwise.label}
          </Link>
        </p>
      )}
    </main>
  );
}
