import { useEffect, useRef, useState } from 'react';
import { Link, useSearchParams } from 'react-router';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { ErrorState } from '@/components/error-state';
import { Page } from '@/components/page';
import { Pager } from '@/components/pager';
import { Loading } from '@/components/spinner';
import { splitLinks } from '@/lib/linkify';
import { pageFromParams, positiveIntParam } from '@/lib/route-params';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { useOutbox, useOutboxMessage } from '../api/outbox-api';

const PAGE_SIZE = 20;
const timeFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', second: '2-digit' });

function received(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : timeFormat.format(date);
}

/** The address with one parameter changed (or removed), keeping the others. */
function withParam(params: URLSearchParams, key: string, value: string | null): string {
  const next = new URLSearchParams(params);
  if (value === null || value === '') next.delete(key);
  else next.set(key, value);
  const qs = next.toString();
  return qs ? `?${qs}` : '';
}

/** Plain text with its web addresses turned into links; the HTML version of a message is never rendered. */
function MessageText({ text }: { text: string }) {
  return (
    <div className="font-ui text-sm leading-relaxed break-words whitespace-pre-wrap">
      {splitLinks(text).map((part, i) =>
        part.kind === 'link' ? (
          <a key={i} href={part.href} rel="noopener noreferrer" className="break-all">
            {part.text}
          </a>
        ) : (
          <span key={i}>{part.text}</span>
        ),
      )}
    </div>
  );
}

function MessageReader({ id, closeSearch }: { id: number; closeSearch: string }) {
  const message = useOutboxMessage(id);
  const heading = useRef<HTMLHeadingElement>(null);

  useEffect(() => {
    if (message.data) heading.current?.focus();
  }, [message.data]);

  return (
    <section aria-label="Message" className="rounded-lg border border-rule bg-card p-5 shadow-leaf">
      <p className="mb-3">
        <Link to={{ search: closeSearch }} className="text-sm">
          Close message
        </Link>
      </p>
      {message.isPending ? (
        <Loading label="Opening the message…" />
      ) : message.isError ? (
        <ErrorState title="This message could not be opened" error={message.error} onRetry={() => void message.refetch()} />
      ) : (
        <article>
          <h2 ref={heading} tabIndex={-1} className="text-xl outline-none">
            {message.data.subject}
          </h2>
          <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 font-ui text-sm">
            <dt className="font-semibold">From</dt>
            <dd className="break-all">{message.data.from}</dd>
            <dt className="font-semibold">To</dt>
            <dd className="break-all">{message.data.to}</dd>
            <dt className="font-semibold">Received</dt>
            <dd>
              <time dateTime={message.data.receivedAt}>{received(message.data.receivedAt)}</time>
            </dd>
          </dl>
          <hr className="my-4 border-rule" />
          <MessageText text={message.data.text} />
          {message.data.html !== null && (
            <p className="mt-4 text-sm text-ink-soft">This message also has an HTML version; only its text version is shown here.</p>
          )}
        </article>
      )}
    </section>
  );
}

/**
 * Every e-mail the site has sent, as caught by the local mail catcher: a list to pick from and
 * a pane that reads one, with its links clickable. For admins checking sign-up and reset mail.
 */
export function OutboxPage() {
  const [params, setParams] = useSearchParams();
  const page = pageFromParams(params);
  const to = params.get('to')?.trim() ?? '';
  const selected = positiveIntParam(params.get('message'));
  const outbox = useOutbox({ page, pageSize: PAGE_SIZE, to: to || undefined });

  const [filter, setFilter] = useState(to);
  const settledFilter = useDebouncedValue(filter.trim(), 350);
  const appliedFilter = useRef(settledFilter);
  useEffect(() => {
    if (settledFilter === appliedFilter.current) return;
    appliedFilter.current = settledFilter;
    setParams(
      (prev) => {
        const next = new URLSearchParams(prev);
        next.delete('page');
        if (settledFilter) next.set('to', settledFilter);
        else next.delete('to');
        return next;
      },
      { replace: true },
    );
  }, [settledFilter, setParams]);

  const data = outbox.data;

  return (
    <Page title="Outbox" width="wide" intro="Mail sent by this site. On a local install nothing leaves the machine: it is caught here instead.">
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <div className="flex-1 space-y-1 sm:max-w-md">
          <label htmlFor="outbox-to" className="block font-bold">
            Recipient
          </label>
          <input
            id="outbox-to"
            type="search"
            value={filter}
            onChange={(event) => setFilter(event.target.value)}
            placeholder="name@example.org"
            className="block w-full rounded-md border border-edge bg-card px-3 py-2 text-base"
          />
        </div>
        <Button variant="secondary" onClick={() => void outbox.refetch()} busy={outbox.isFetching && !outbox.isPending}>
          Check for new mail
        </Button>
      </div>

      <div className="mt-6 grid gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
        <div className={selected ? 'order-2 lg:order-1' : ''}>
          {outbox.isPending ? (
            <Loading label="Loading the outbox…" />
          ) : outbox.isError ? (
            <ErrorState error={outbox.error} onRetry={() => void outbox.refetch()} />
          ) : data && data.items.length === 0 ? (
            <EmptyState title={to ? `No mail to “${to}” yet.` : 'No mail has been sent yet.'}>
              New messages show up here within a few seconds.
            </EmptyState>
          ) : data ? (
            <>
              <div className="overflow-hidden rounded-lg border border-rule bg-card shadow-leaf">
                <table className="w-full border-collapse font-ui text-sm">
                  <caption className="sr-only">Sent messages, newest first</caption>
                  <thead className="border-b-2 border-rule">
                    <tr>
                      <th scope="col" className="px-3 py-2 text-left font-semibold">
                        Subject
                      </th>
                      <th scope="col" className="hidden px-3 py-2 text-left font-semibold sm:table-cell">
                        To
                      </th>
                      <th scope="col" className="px-3 py-2 text-left font-semibold">
                        Received
                      </th>
                    </tr>
                  </thead>
                  <tbody>
                    {data.items.map((item) => {
                      const current = item.id === selected;
                      return (
                        <tr key={item.id} className={`border-b border-rule last:border-b-0 ${current ? 'bg-moss-wash' : ''}`}>
                          <td className="px-3 py-2">
                            <Link
                              to={{ search: withParam(params, 'message', String(item.id)) }}
                              aria-current={current ? 'true' : undefined}
                              className="font-semibold"
                            >
                              {item.subject}
                            </Link>
                            <span className="block break-all text-ink-soft sm:hidden">{item.to}</span>
                          </td>
                          <td className="hidden px-3 py-2 break-all sm:table-cell">{item.to}</td>
                          <td className="px-3 py-2 whitespace-nowrap">
                            <time dateTime={item.receivedAt}>{received(item.receivedAt)}</time>
                          </td>
                        </tr>
                      );
                    })}
                  </tbody>
                </table>
              </div>
              <p className="mt-2 text-sm text-ink-soft">The list checks for new mail every few seconds.</p>
              <Pager
                label="Pages of mail"
                page={data.page}
                pageSize={data.pageSize}
                total={data.total}
                onPageChange={(p) => setParams(new URLSearchParams(withParam(params, 'page', p === 1 ? null : String(p))))}
              />
            </>
          ) : null}
        </div>

        <div className={selected ? 'order-1 lg:order-2' : 'hidden lg:block'}>
          {selected ? (
            <MessageReader key={selected} id={selected} closeSearch={withParam(params, 'message', null)} />
          ) : (
            <div className="rounded-lg border border-dashed border-edge px-5 py-10 text-center text-ink-soft">Pick a subject to read the message.</div>
          )}
        </div>
      </div>
    </Page>
  );
}
