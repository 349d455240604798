import Link from "next/link";

interface PagerProps {
  page: number;
  pageSize: number;
  total: number;
  /** The link to a page number. */
  hrefFor: (page: number) => string;
  label: string;
}

/** Previous / next links for a server-paged list (plain links: they work without JavaScript). */
export function Pager({ page, pageSize, total, hrefFor, label }: PagerProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  if (pages <= 1) return null;
  const link = "rounded border border-hairline bg-white px-2 py-1";
  return (
    <nav aria-label={label} className="flex flex-wrap items-center gap-3 text-sm" data-testid="pager">
      {page > 1 ? (
        <Link href={hrefFor(page - 1)} className={link} rel="prev">
          Previous
        </Link>
      ) : (
        <span className={`${link} text-muted`} aria-disabled="true">
          Previous
        </span>
      )}
      <span>
        Page <span className="figure">{page}</span> of <span className="figure">{pages}</span> · <span className="figure">{total}</span> in
        all
      </span>
      {page < pages ? (
        <Link href={hrefFor(page + 1)} className={link} rel="next">
          Next
        </Link>
      ) : (
        <span className={`${link} text-muted`} aria-disabled="true">
          Next
        </span>
      )}
    </nav>
  );
}
