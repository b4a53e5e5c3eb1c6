import { useState } from 'react';
import { Link, useLocation } from 'react-router-dom';
import { can } from '@shared/policies.ts';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { AnchorButton, LinkButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { toActor } from '@/features/session/to-actor.ts';
import { useProposePart } from '@/features/parts/api/propose-part.ts';
import { ProposePartForm } from '@/features/parts/components/propose-part-form.tsx';

/** /parts/propose: a signed-in maker proposes a part; it waits for a moderator before it is listed. */
export function ProposePartPage() {
  const { data: session } = useSession();
  const location = useLocation();
  const propose = useProposePart();
  const [proposed, setProposed] = useState<{ id: number; name: string } | null>(null);
  const header = (
    <PageHeader title="Propose a part" lead="Add a salvaged transducer to the registry so its calibration runs can be pooled." />
  );

  if (!can(toActor(session?.user ?? null), 'content.create')) {
    return (
      <div>
        {header}
        <Notice title="Sign in to propose a part">
          <p>Proposals carry your name so a moderator can ask about them.</p>
          <p>
            <AnchorButton href={paths.signIn(location.pathname)}>Sign in</AnchorButton>
          </p>
        </Notice>
      </div>
    );
  }
  if (proposed) {
    return (
      <div>
        {header}
        <div role="status" className="max-w-2xl rounded-lg border border-teal bg-white p-5">
          <p className="text-lg font-semibold">Proposed: waiting for a moderator</p>
          <p className="mt-2">
            “{proposed.name}” is saved, but it is <strong>not in the registry yet</strong>. A moderator checks each proposal; once they
            accept it, it is listed and calibration runs can count towards it. Until then only you and the moderators can open its page.
          </p>
          <p className="mt-2">
            Photos help the moderator and later readers recognise the part: add them on its page (markings, size against a rule, where it
            sat in the donor device).
          </p>
          <div className="mt-4 flex flex-wrap gap-3">
            <LinkButton to={paths.part(proposed.id)} variant="secondary">
              Open its page and add photos
            </LinkButton>
            <LinkButton to={paths.parts} variant="ghost">
              Back to the registry
            </LinkButton>
            <button
              type="button"
              className="text-sm text-copper-dark underline"
              onClick={() => {
                propose.reset();
                setProposed(null);
              }}
            >
              Propose another part
            </button>
          </div>
        </div>
      </div>
    );
  }
  return (
    <div>
      {header}
      <p className="mb-4 text-sm text-ink-soft">
        Check the{' '}
        <Link to={paths.parts} className="text-copper-dark underline">
          registry
        </Link>{' '}
        first: a part already listed under another name is better reported as a duplicate than proposed again.
      </p>
      <ProposePartForm
        onPropose={async (input) => {
          const r = await propose.mutateAsync(input);
          setProposed({ id: r.id, name: input.name });
        }}
      />
    </div>
  );
}
