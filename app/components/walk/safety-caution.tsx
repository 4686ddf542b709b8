/** The shut-down caution, shown on every safety stop and on every guide desk page. */
export function SafetyCaution({ compact = false }: { compact?: boolean }) {
  return (
    <div role="note" aria-label="Shut-down caution" className="rounded-lg border-4 border-ink bg-caution p-4 text-ink">
      <p className="text-lg font-bold">Hands-on steps are only for a stopped, locked-out machine.</p>
      {compact ? null : (
        <p className="mt-1">
          Clutch out, engine off, key out, moving parts stopped, hose pressure relieved, hot parts cooled, controls tagged. Your company's own procedure, the
          maker's manual and local codes come first. Tankside never tells you a step is safe, and its guides do not replace training.
        </p>
      )}
    </div>
  );
}
