import { ChevronDownIcon } from '@radix-ui/react-icons';
import { Button, DropdownMenu } from '@radix-ui/themes';
import { likelihoodPhrase, likelihoodTerms } from '@skyledger/explainer';
import type { Editor } from '@tiptap/react';
import { useRef } from 'react';

/**
 * The IPCC's calibrated likelihood words, each inserted with its probability range beside
 * it ("very likely (90–100 %)"), so readers know what the word commits to.
 */
export function LikelihoodMenu({ editor }: { editor: Editor }) {
  const inserted = useRef(false);
  return (
    <DropdownMenu.Root>
      <DropdownMenu.Trigger>
        <Button type="button" size="1" variant="soft" color="gray" highContrast>
          Uncertainty words
          <ChevronDownIcon aria-hidden />
        </Button>
      </DropdownMenu.Trigger>
      <DropdownMenu.Content
        onCloseAutoFocus={(event) => {
          if (!inserted.current) return;
          inserted.current = false;
          event.preventDefault();
          editor.commands.focus();
        }}
      >
        <DropdownMenu.Label>IPCC likelihood, with its probability</DropdownMenu.Label>
        {likelihoodTerms.map(({ term }) => (
          <DropdownMenu.Item
            key={term}
            onSelect={() => {
              inserted.current = true;
              editor
                .chain()
                .insertContent({ type: 'text', text: likelihoodPhrase(term) })
                .run();
            }}
          >
            {likelihoodPhrase(term)}
          </DropdownMenu.Item>
        ))}
      </DropdownMenu.Content>
    </DropdownMenu.Root>
  );
}
