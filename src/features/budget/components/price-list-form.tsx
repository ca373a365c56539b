// The farm's price list: one price per item, each with its unit, and the words "example value —
// replace with your local figure" beside every price still at its example. Farmers and advisors
// change it (with the version read; a 409 reads the other person's list); costs everywhere
// follow it.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { TextField } from '../../../components/ui/text-field';
import { isApiError } from '../../../lib/api-client';
import { plainMessage, toNumberOrNull } from '../../../lib/form-values';
import { currencySign } from '../../../lib/money';
import { PRICE_ITEMS, PRICE_KEYS, PricesUpdate, type AmendmentChoices, type PriceKey, type PriceList } from '../../../../shared/schemas/treatments';
import { AmendmentInputs } from './amendment-inputs';
import { usePrices } from '../api/get-prices';
import { useUpdatePrices } from '../api/update-prices';

const EXAMPLE_WORDS = 'example value — replace with your local figure';

type Values = { version: number; currency: string; prices: Record<PriceKey, number | null>; amendments: Record<keyof AmendmentChoices, number | null> };
type Output = z.output<typeof PricesUpdate>;

const validCurrency = (c: string) => /^[A-Z]{3}$/.test(c);

function saveError(error: unknown): string {
  if (isApiError(error, 409))
    return 'Someone else changed the prices while you were working on them, so yours were not saved. Their list is now shown; make your change again.';
  if (isApiError(error, 403)) return 'Your role on this farm does not allow changing the prices.';
  if (isApiError(error, 400) || isApiError(error, 422)) {
    const issues = error.issues.map((i) => i.message);
    return issues.length ? `The prices were not saved: ${issues.join('; ')}.` : error.message;
  }
  return error instanceof Error ? error.message : 'The prices were not saved.';
}

function PriceForm({ list, onSave, saving }: { list: PriceList; onSave: (v: Output) => void; saving: boolean }) {
  const form = useForm<Values, unknown, Output>({
    // Boxes may be empty (null); the schema says each price is a number of at least 0.
    resolver: zodResolver(PricesUpdate) as unknown as Resolver<Values, unknown, Output>,
    defaultValues: { version: list.version, currency: list.currency, prices: { ...list.prices }, amendments: { ...list.amendments } },
  });
  const { register, handleSubmit, formState, control } = form;
  const currency = useWatch({ control, name: 'currency' });
  const sign = validCurrency(currency) ? currencySign(currency) : currency;
  const examples = new Set(list.exampleKeys);

  return (
    <form className="flex flex-col gap-3" data-testid="price-form" onSubmit={handleSubmit(onSave)} noValidate>
      <TextField
        label="Currency"
        className="w-32"
        maxLength={3}
        autoCapitalize="characters"
        error={plainMessage(formState.errors.currency?.message)}
        hint="Three-letter code, e.g. USD, EUR, CAD."
        data-testid="price-currency"
        {...register('currency', { setValueAs: (v: unknown) => String(v ?? '').trim().toUpperCase() })}
      />
      <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2">
        {PRICE_KEYS.map((key) => {
          const item = PRICE_ITEMS[key];
          const example = examples.has(key);
          return (
            <TextField
              key={key}
              label={`${item.label} (${sign} ${item.unit})`}
              inputMode="decimal"
              className="num"
              error={plainMessage(formState.errors.prices?.[key]?.message)}
              hint={example ? <span className="text-caution" data-testid="price-example">{EXAMPLE_WORDS}</span> : undefined}
              data-testid={`price-${key}`}
              {...register(`prices.${key}`, { setValueAs: toNumberOrNull })}
            />
          );
        })}
      </div>
      <AmendmentInputs register={register} errors={formState.errors} examples={list.amendmentExamples} />
      <Button type="submit" size="sm" className="self-start" disabled={saving} data-testid="price-save">
        {saving ? 'Saving…' : 'Save the prices'}
      </Button>
    </form>
  );
}

/** Shown to farmers and advisors only: both may change the prices. */
export function PriceListPanel({ farmId }: { farmId: number }) {
  const prices = usePrices(farmId);
  const update = useUpdatePrices(farmId);

  return (
    <section aria-labelledby="prices-heading" className="flex flex-col gap-3 rounded-md border border-paper-edge bg-white/40 p-3" data-testid="price-list">
      <h2 id="prices-heading" className="text-lg font-semibold">
        Prices the costs are worked out with
      </h2>
      {prices.isPending ? (
        <p className="text-sm text-ink-soft">Loading the prices…</p>
      ) : prices.isError ? (
        <Notice tone="error">{prices.error.message}</Notice>
      ) : (
        <>
          {prices.data.exampleKeys.length ? (
            <Notice tone="caution" testId="prices-examples-notice">
              {prices.data.exampleKeys.length === PRICE_KEYS.length ? 'Every price' : `${prices.data.exampleKeys.length} of the prices`} here{' '}
              {prices.data.exampleKeys.length === 1 ? 'is an example value' : 'are example values'}, not what things cost near you. Replace them with
              your local figures before you rely on a cost or a plan.
            </Notice>
          ) : null}
          {prices.data.updatedBy && prices.data.updatedAt ? (
            <p className="text-xs text-ink-soft" data-testid="prices-updated">
              Last changed by {prices.data.updatedBy},{' '}
              {new Date(prices.data.updatedAt).toLocaleString('en-US', { dateStyle: 'medium', timeStyle: 'short' })}.
            </p>
          ) : null}
          <PriceForm key={prices.data.version} list={prices.data} saving={update.isPending} onSave={(v) => update.mutate(v)} />
          {update.isError ? <Notice tone="error">{saveError(update.error)}</Notice> : null}
          {update.isSuccess && !update.isPending ? (
            <p role="status" className="text-sm text-ink-soft" data-testid="prices-saved">
              Saved. Every cost and the plan are being worked out again with these prices.
            </p>
          ) : null}
        </>
      )}
    </section>
  );
}
