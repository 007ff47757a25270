import { Button, Flex, Separator } from '@radix-ui/themes';
import { useEditorState, type ChainedCommands, type Editor } from '@tiptap/react';
import type { ReactNode } from 'react';
import { CiteSourceDialog } from './cite-source-dialog';
import { InsertWorkingDialog } from './insert-working-dialog';
import { LikelihoodMenu } from './likelihood-menu';
import { LinkDialog } from './link-dialog';

interface FormatButtonProps {
  editor: Editor;
  /** What the button does, for those who do not see its short face. */
  label: string;
  pressed: boolean;
  command: (chain: ChainedCommands) => ChainedCommands;
  children: ReactNode;
}

function FormatButton({ editor, label, pressed, command, children }: FormatButtonProps) {
  return (
    <Button
      type="button"
      size="1"
      variant={pressed ? 'solid' : 'soft'}
      color="gray"
      highContrast
      aria-label={label}
      aria-pressed={pressed}
      onClick={() => command(editor.chain().focus()).run()}
    >
      {children}
    </Button>
  );
}

/** The explainer's tools: its few formats, links, and what only an explainer has. */
export function ExplainerToolbar({ editor }: { editor: Editor }) {
  const active = useEditorState({
    editor,
    selector: ({ editor: current }) => ({
      heading2: current.isActive('heading', { level: 2 }),
      heading3: current.isActive('heading', { level: 3 }),
      bold: current.isActive('bold'),
      italic: current.isActive('italic'),
      bulletList: current.isActive('bulletList'),
      orderedList: current.isActive('orderedList'),
      blockquote: current.isActive('blockquote'),
      link: current.isActive('link'),
    }),
  });
  return (
    <Flex gap="2" wrap="wrap" align="center" role="group" aria-label="Explainer tools">
      <FormatButton
        editor={editor}
        label="Heading"
        pressed={active.heading2}
        command={(chain) => chain.toggleHeading({ level: 2 })}
      >
        H2
      </FormatButton>
      <FormatButton
        editor={editor}
        label="Subheading"
        pressed={active.heading3}
        command={(chain) => chain.toggleHeading({ level: 3 })}
      >
        H3
      </FormatButton>
      <FormatButton
        editor={editor}
        label="Bold"
        pressed={active.bold}
        command={(chain) => chain.toggleBold()}
      >
        <strong>B</strong>
      </FormatButton>
      <FormatButton
        editor={editor}
        label="Italic"
        pressed={active.italic}
        command={(chain) => chain.toggleItalic()}
      >
        <em>I</em>
      </FormatButton>
      <FormatButton
        editor={editor}
        label="Bulleted list"
        pressed={active.bulletList}
        command={(chain) => chain.toggleBulletList()}
      >
        • List
      </FormatButton>
      <FormatButton
        editor={editor}
        label="Numbered list"
        pressed={active.orderedList}
        command={(chain) => chain.toggleOrderedList()}
      >
        1. List
      </FormatButton>
      <FormatButton
        editor={editor}
        label="Quote"
        pressed={active.blockquote}
        command={(chain) => chain.toggleBlockquote()}
      >
        “ Quote
      </FormatButton>
      <LinkDialog editor={editor} active={active.link} />
      <Separator orientation="vertical" size="1" />
      <InsertWorkingDialog editor={editor} />
      <CiteSourceDialog editor={editor} />
      <LikelihoodMenu editor={editor} />
    </Flex>
  );
}
