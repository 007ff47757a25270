import { SelectField } from './select-field';

type Order = 'asc' | 'desc';

export interface SortChoice<Field extends string> {
  field: Field;
  order: Order;
  label: string;
}

interface SortSelectProps<Field extends string> {
  choices: readonly SortChoice<Field>[];
  sort: Field;
  order: Order;
  onSort: (sort: Field, order: Order) => void;
}

/** A table's sort where there are no column headers to click (cards on a phone): column and direction as one choice. */
export function SortSelect<Field extends string>({
  choices,
  sort,
  order,
  onSort,
}: SortSelectProps<Field>) {
  const valueOf = (choice: { field: Field; order: Order }) => `${choice.field} ${choice.order}`;
  return (
    <SelectField
      label="Sort by"
      value={valueOf({ field: sort, order })}
      options={choices.map((choice) => ({ value: valueOf(choice), label: choice.label }))}
      onValueChange={(value) => {
        const chosen = choices.find((choice) => valueOf(choice) === value);
        if (chosen) onSort(chosen.field, chosen.order);
      }}
    />
  );
}
