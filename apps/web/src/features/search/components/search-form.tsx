import { zodResolver } from '@hookform/resolvers/zod';
import { MagnifyingGlassIcon } from '@radix-ui/react-icons';
import { Button, Card, Grid } from '@radix-ui/themes';
import { dateSchema, searchQuerySchema } from '@skyledger/contracts';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { TextInputField } from '@/components/ui/text-input-field';
import type { SearchView } from '../api/search-url';

const emptyOr = <T extends z.ZodType>(schema: T) => z.union([z.literal(''), schema]);

const searchFormSchema = z
  .object({
    q: searchQuerySchema.shape.q,
    from: emptyOr(dateSchema),
    to: emptyOr(dateSchema),
  })
  .refine((form) => !form.from || !form.to || form.from <= form.to, {
    error: 'The end of the range must not be before its start',
    path: ['to'],
  });
type SearchForm = z.input<typeof searchFormSchema>;

interface SearchFormProps {
  view: SearchView;
  onSearch: (changes: Pick<SearchView, 'q' | 'from' | 'to'>) => void;
}

/** The words and the date range; facets stay as chosen when the words change. */
export function SearchForm({ view, onSearch }: SearchFormProps) {
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm<SearchForm>({
    resolver: zodResolver(searchFormSchema),
    defaultValues: { q: view.q ?? '', from: view.from ?? '', to: view.to ?? '' },
  });
  const submit = handleSubmit((form) => {
    const { q, from, to } = searchFormSchema.parse(form);
    onSearch({ q, from: from || undefined, to: to || undefined });
  });

  return (
    <Card size="2">
      <form role="search" aria-label="Search the desk" noValidate onSubmit={submit}>
        <Grid columns={{ initial: '1', sm: '2', md: '1fr 10rem 10rem auto' }} gap="4" align="start">
          <TextInputField
            label="Search for"
            hint="Words from a claim, a claimant, a topic or a source; typos are forgiven"
            type="search"
            autoComplete="off"
            autoFocus={!view.q}
            error={errors.q?.message}
            {...register('q')}
          />
          <TextInputField
            label="From"
            hint="Filed, added or published on or after"
            type="date"
            error={errors.from?.message}
            {...register('from')}
          />
          <TextInputField
            label="To"
            hint="The whole of this day counts"
            type="date"
            error={errors.to?.message}
            {...register('to')}
          />
          {/* Lined up with the inputs, below their labels (a size-2 line and a gap). */}
          <Button type="submit" size="3" highContrast mt={{ initial: '0', md: '5' }}>
            <MagnifyingGlassIcon aria-hidden />
            Search
          </Button>
        </Grid>
      </form>
    </Card>
  );
}
