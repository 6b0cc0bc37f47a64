import { Button } from '@/components/ui/button';

interface ClientsPagerProps {
  page: number;
  pages: number;
  onPageChange: (page: number) => void;
}

/** Previous and next page, with where you are. */
export function ClientsPager({ page, pages, onPageChange }: ClientsPagerProps) {
  if (pages <= 1) return null;
  return (
    <nav aria-label="Pages of clients" className="mt-4 flex items-center justify-end gap-3">
      <Button compact disabled={page <= 1} onClick={() => onPageChange(page - 1)}>
        Previous page
      </Button>
      <span className="num text-sm text-muted" aria-current="page">
        Page {page} of {pages}
      </span>
      <Button compact disabled={page >= pages} onClick={() => onPageChange(page + 1)}>
        Next page
      </Button>
    </nav>
  );
}
