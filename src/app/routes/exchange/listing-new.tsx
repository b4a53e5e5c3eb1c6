import { useLocation, useNavigate, useSearchParams } from 'react-router-dom';
import { can } from '@shared/policies.ts';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { AnchorButton } from '@/components/ui/link-button.tsx';
import { paths } from '@/config/paths.ts';
import { useSession } from '@/features/session/api/get-session.ts';
import { toActor } from '@/features/session/to-actor.ts';
import { useCreateListing } from '@/features/exchange/api/listing-mutations.ts';
import { ListingForm } from '@/features/exchange/components/listing-form.tsx';
import { parseId } from '@/utils/parse-id.ts';

/** /exchange/new (?partId= to start from a part): offer or seek a listed part. */
export function ListingNewPage() {
  const { data: session } = useSession();
  const location = useLocation();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const create = useCreateListing();
  const partId = parseId(params.get('partId') ?? undefined) ?? undefined;
  const header = (
    <PageHeader title="New listing" lead="Offer spare parts or say what you are looking for. Others write to you through Scanwright." />
  );
  if (!can(toActor(session?.user ?? null), 'content.create')) {
    return (
      <div>
        {header}
        <Notice title="Sign in to post a listing">
          <p>
            <AnchorButton href={paths.signIn(location.pathname + location.search)}>Sign in</AnchorButton>
          </p>
        </Notice>
      </div>
    );
  }
  return (
    <div>
      {header}
      <ListingForm
        defaults={{ partId }}
        submitLabel="Post listing"
        onSave={async (input) => {
          const l = await create.mutateAsync(input);
          navigate(paths.listing(l.id));
        }}
      />
    </div>
  );
}
