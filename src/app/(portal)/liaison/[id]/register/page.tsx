import type { Metadata } from 'next';
import Link from 'next/link';
import { numberFromOneQuery, readQuery } from '@/lib/http/query-params';
import { portalTime } from '@/lib/dates/portal-time';
import { loadParcelRegister } from '@/lib/parcels/load-parcel-register';
import { parcelInputOf } from '@/lib/parcels/parcel-record';
import { isSearching, searchRegister } from '@/lib/parcels/search-register';
import { registerSearchSchema } from '@/lib/validation/register-schemas';
import { EmptyState } from '@/components/ui/empty-state';
import { UnreadableAddress } from '@/components/ui/unreadable-address';
import { orNotFound, requireLiaisonPage } from '../../_components/scheme-page-access';
import { ParcelTable } from './parcel-table';
import { RegisterForm } from './register-form';
import { RegisterSearchForm } from './register-search';

export const metadata: Metadata = { title: 'Parcels register' };

const registerQuery = registerSearchSchema.extend({ version: numberFromOneQuery('the register version').optional() });

export default async function RegisterPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { id } = await params;
  const { user, access } = await requireLiaisonPage(id, `/liaison/${id}/register`);
  const read = readQuery(registerQuery, await searchParams);
  if (!read.ok) return <UnreadableAddress issues={read.issues} plainHref={`/liaison/${id}/register`} plainLabel="Open the current register" />;
  const loaded = await orNotFound(() => loadParcelRegister({ user, schemeId: id, version: read.data.version }));
  if (!loaded.register) {
    return <EmptyState title="This scheme has no parcels register yet.">{access === 'manage' ? <Link className="text-accent underline" href={`/liaison/${id}/upload`}>Upload the parcels CSV</Link> : 'A landowner liaison officer uploads it.'}</EmptyState>;
  }
  const { version, ...search } = read.data;
  const searching = isSearching(search);
  const shown = searching ? searchRegister(loaded.parcels, search) : loaded.parcels;
  const editable = access === 'manage' && loaded.register.isLatest && !searching;
  const plainHref = `/liaison/${id}/register${version !== undefined ? `?version=${version}` : ''}`;
  return (
    <>
      <div className="mb-4 flex flex-wrap items-baseline justify-between gap-3">
        <h2 className="text-lg font-semibold">
          Version <span className="num">{loaded.register.version}</span>{loaded.register.isLatest ? ' (current)' : ' (earlier version, read only)'}
          <span className="ml-2 text-sm font-normal text-ink-soft">{loaded.register.note} · <time className="num" dateTime={loaded.register.createdAt}>{portalTime(loaded.register.createdAt)}</time></span>
        </h2>
        <span className="flex gap-4 text-sm">
          <Link className="text-accent underline" href={`/liaison/${id}/register/history`}>History of the register</Link>
          <a className="text-accent underline" href={`/api/parcels/${id}/export?table=register`} download>Export as CSV<span className="sr-only"> (the parcels register)</span></a>
        </span>
      </div>
      <p className="mb-4 text-sm text-ink-soft">Distances are measured upstream from the structure along the river, in metres; ground levels in metres above the survey datum. Leave the ground level empty to judge flooding by the top of the bank.</p>
      <RegisterSearchForm search={search} version={version} clearHref={plainHref} />
      {searching ? (
        <p role="status" className="mb-3 text-sm">
          Showing <span className="num">{shown.length}</span> of <span className="num">{loaded.parcels.length}</span> parcels.{access === 'manage' && loaded.register.isLatest ? <> To edit the register, <a className="text-accent underline" href={plainHref}>clear the search</a>.</> : null}
        </p>
      ) : null}
      {editable ? <RegisterForm schemeId={id} baseRegisterId={loaded.register.id} parcels={loaded.parcels.map(parcelInputOf)} /> : <ParcelTable parcels={shown} />}
    </>
  );
}
