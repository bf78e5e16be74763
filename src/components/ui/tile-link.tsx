import { Link } from 'react-router-dom';

/** A way to another page, drawn as a large tile (44 px tall: easy to hit on a phone). */
export function TileLink({ to, label, className = 'flex' }: { to: string; label: string; className?: string }) {
  return (
    <Link to={to} className={`${className} min-h-11 items-center rounded-lg border border-line-strong bg-paper px-3 font-bold hover:bg-paper-deep`}>
      {label}
    </Link>
  );
}
