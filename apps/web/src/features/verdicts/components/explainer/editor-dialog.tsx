import { Button, Dialog, Flex } from '@radix-ui/themes';
import type { Editor } from '@tiptap/react';
import { useState, type ReactNode } from 'react';

/** Runs a change to the document, then closes the dialog and puts the caret back in the text. */
export type DoneWith = (change: () => void) => void;

interface EditorDialogProps {
  editor: Editor;
  /** The toolbar button's words. */
  trigger: string;
  title: string;
  description: string;
  disabled?: boolean;
  children: (done: DoneWith) => ReactNode;
}

/** A toolbar dialog that changes the explainer: inserting a working, citing a source, a link. */
export function EditorDialog({
  editor,
  trigger,
  title,
  description,
  disabled,
  children,
}: EditorDialogProps) {
  const [open, setOpen] = useState(false);
  const [changed, setChanged] = useState(false);
  const done: DoneWith = (change) => {
    change();
    setChanged(true);
    setOpen(false);
  };
  return (
    <Dialog.Root open={open} onOpenChange={setOpen}>
      <Dialog.Trigger>
        <Button type="button" size="1" variant="soft" color="gray" highContrast disabled={disabled}>
          {trigger}
        </Button>
      </Dialog.Trigger>
      <Dialog.Content
        maxWidth="640px"
        onCloseAutoFocus={(event) => {
          if (!changed) return;
          setChanged(false);
          event.preventDefault();
          editor.commands.focus();
        }}
      >
        <Dialog.Title>{title}</Dialog.Title>
        <Dialog.Description size="2" mb="4">
          {description}
        </Dialog.Description>
        {children(done)}
        <Flex justify="end" mt="4">
          <Dialog.Close>
            <Button type="button" variant="soft" color="gray" highContrast>
              Close
            </Button>
          </Dialog.Close>
        </Flex>
      </Dialog.Content>
    </Dialog.Root>
  );
}
