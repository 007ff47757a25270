import { zodResolver } from '@hookform/resolvers/zod';
import { Button, Flex } from '@radix-ui/themes';
import { isAllowedHref } from '@skyledger/explainer';
import type { Editor } from '@tiptap/react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { TextInputField } from '@/components/ui/text-input-field';
import { EditorDialog, type DoneWith } from './editor-dialog';

// The explainer's own rule (packages/explainer): the server drops any other link.
const linkFormSchema = z.object({
  href: z.string().trim().refine(isAllowedHref, {
    error: 'Enter an address starting with https://, http:// or mailto:',
  }),
});
type LinkForm = z.input<typeof linkFormSchema>;

function setLink(editor: Editor, href: string) {
  const { empty } = editor.state.selection;
  if (empty && !editor.isActive('link')) {
    // Nothing chosen to link: the address itself becomes the linked text.
    editor
      .chain()
      .insertContent({ type: 'text', text: href, marks: [{ type: 'link', attrs: { href } }] })
      .run();
    return;
  }
  editor.chain().extendMarkRange('link').setLink({ href }).run();
}

function LinkFields({ editor, done }: { editor: Editor; done: DoneWith }) {
  const current = editor.getAttributes('link').href as string | undefined;
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm<LinkForm>({
    resolver: zodResolver(linkFormSchema),
    defaultValues: { href: current ?? '' },
  });
  return (
    <form
      aria-label="Link"
      noValidate
      onSubmit={(event) => {
        // The dialog sits inside the verdict's form: keep this submit to itself.
        event.stopPropagation();
        void handleSubmit(({ href }) => done(() => setLink(editor, href)))(event);
      }}
    >
      <Flex direction="column" gap="3">
        <TextInputField
          label="Address"
          hint="A web page (https://…) or an e-mail address (mailto:…)"
          autoComplete="off"
          error={errors.href?.message}
          {...register('href')}
        />
        <Flex gap="3" wrap="wrap">
          <Button type="submit" highContrast>
            {current ? 'Change the link' : 'Add the link'}
          </Button>
          {current ? (
            <Button
              type="button"
              variant="soft"
              color="red"
              highContrast
              onClick={() => done(() => editor.chain().extendMarkRange('link').unsetLink().run())}
            >
              Remove the link
            </Button>
          ) : null}
        </Flex>
      </Flex>
    </form>
  );
}

/** Links the chosen words to a web page or an e-mail address; other schemes are refused. */
export function LinkDialog({ editor, active }: { editor: Editor; active: boolean }) {
  return (
    <EditorDialog
      editor={editor}
      trigger={active ? 'Edit link' : 'Link'}
      title={active ? 'Edit the link' : 'Add a link'}
      description="Choose the words to link first; with none chosen, the address itself is added as the link."
    >
      {(done) => <LinkFields editor={editor} done={done} />}
    </EditorDialog>
  );
}
