import Link from "next/link";

interface PagerProps {
  basePath: string;
  page: number;
  pageSize: number;
  total: number;
  testId?: string;
}

/** Server-side pages of a Workshop list: links that carry ?page=, so a page is a URL. */
export function Pager({ basePath, page, pageSize, total, testId = "pager" }: PagerProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  const link = (to: number) => `${basePath}?page=${to}`;
  return (
    <div className="flex items-center gap-3 text-sm text-muted" data-testid={testId}>
      <span>{total === 0 ? "None yet." : `${first}–${last} of ${total}`}</span>
      {page > 1 && (
        <Link href={link(page - 1)} className="text-accent-dark underline" rel="prev">
          Previous
        </Link>
      )}
      {page < pages && (
        <Link href={link(page + 1)} className="text-accent-dark underline" rel="next">
          Next
        </Link>
      )}
    </div>
  );
}
