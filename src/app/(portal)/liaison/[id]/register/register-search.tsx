import { BANK_SIDES } from '@/lib/validation/parcel-schemas';
import { CONTACT_FILTERS, REGISTER_SORTS, type RegisterSearch } from '@/lib/validation/register-schemas';
import { buttonClassName, inputClassName } from '@/components/ui/form-field';

/** Search, filter and sort the register: a plain GET form, so every view has its own address. */
export function RegisterSearchForm({ search, version, clearHref }: { search: RegisterSearch; version?: number; clearHref: string }) {
  return (
    <form method="get" role="search" aria-label="Search the register" className="mb-4 flex flex-wrap items-end gap-3">
      {version !== undefined ? <input type="hidden" name="version" value={version} /> : null}
      <div className="min-w-[14rem] grow">
        <label htmlFor="register-q" className="block text-sm font-semibold">Search</label>
        <input id="register-q" name="q" type="search" defaultValue={search.q ?? ''} placeholder="Parcel, owner, address, e-mail or land use" className={inputClassName} />
      </div>
      <div>
        <label htmlFor="register-bank" className="block text-sm font-semibold">Bank</label>
        <select id="register-bank" name="bank" defaultValue={search.bank ?? ''} className={inputClassName}>
          <option value="">Any bank</option>
          {BANK_SIDES.map((b) => <option key={b} value={b}>{b === 'both' ? 'Both banks' : `${b[0].toUpperCase()}${b.slice(1)} bank`}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor="register-contact" className="block text-sm font-semibold">Letters go</label>
        <select id="register-contact" name="contact" defaultValue={search.contact ?? ''} className={inputClassName}>
          <option value="">Either way</option>
          {Object.entries(CONTACT_FILTERS).map(([value, words]) => <option key={value} value={value}>{words}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor="register-sort" className="block text-sm font-semibold">Order by</label>
        <select id="register-sort" name="sort" defaultValue={search.sort ?? 'distance'} className={inputClassName}>
          {Object.entries(REGISTER_SORTS).map(([value, words]) => <option key={value} value={value}>{words}</option>)}
        </select>
      </div>
      <button type="submit" className={buttonClassName}>Show</button>
      <a href={clearHref} className="py-2 text-sm text-accent underline">Clear</a>
    </form>
  );
}
