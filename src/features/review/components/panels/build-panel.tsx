import { Link } from 'react-router-dom';
import { buildDecisionInput, type QueueBuildDto } from '@shared/schemas/review.ts';
import { type BuildDto } from '@shared/schemas/build.ts';
import { buildStageLabels, instrumentKindLabels } from '@shared/schemas/build-vocabulary.ts';
import { Markdown } from '@/components/ui/markdown.tsx';
import { paths } from '@/config/paths.ts';
import { useReviewBuild } from '@/features/review/api/get-review-build.ts';
import { useDecideBuild } from '@/features/review/api/decide-build.ts';
import { useReviewBuildRuns } from '@/features/review/api/get-review-build-runs.ts';
import { useReviewHistory } from '@/features/review/api/get-review-history.ts';
import { DecisionForm } from '../decision/decision-form.tsx';
import { age, count } from '../format.ts';
import { formatDate } from '@shared/format/dates.ts';
import { BuildPhotos } from './build-photos.tsx';
import { BuildRuns } from './build-runs.tsx';
import { PublishWithRuns } from './publish-with-runs.tsx';
import { ReviewHistory } from './review-history.tsx';
import { buildChoices, editedChoices } from './decision-choices.ts';
import { Facts, PanelFrame, PanelSection } from './panel-frame.tsx';
import { ReviewThread } from '@/components/review-thread/review-thread.tsx';

/** A submitted (or edited published) build: summary, write-up, photos and actuators, then publish / return / decline. */
export function BuildPanel({ build, edited, onDecided }: { build: QueueBuildDto; edited: boolean; onDecided: (decision: string) => void }) {
  const full = useReviewBuild(build.id);
  const decide = useDecideBuild();
  const runs = useReviewBuildRuns(build.id);
  const history = useReviewHistory(build.id);
  const when = edited
    ? `edited ${age(build.updatedAt)} ago`
    : `submitted ${formatDate(build.submittedAt)}, ${age(build.submittedAt ?? build.updatedAt)} waiting`;
  return (
    <PanelFrame
      eyebrow={edited ? 'Published build, edited since review' : 'Build submitted for review'}
      title={build.title}
      meta={
        <>
          by {build.author.login} · {when} ·{' '}
          <Link className="text-copper underline" to={paths.build(build.id)}>
            Open the build page
          </Link>
        </>
      }
      decision={
        <div className="space-y-3">
          <DecisionForm
            id={`build-${build.id}`}
            schema={buildDecisionInput}
            choices={edited ? editedChoices : buildChoices}
            noteLabel="Note to the maker"
            noteHint="Required to return or decline: say what to change or why. The maker sees it on the build and by e-mail; visitors do not, unless you tick the box below when publishing."
            publicNote={{ decision: 'publish', label: 'When publishing, show this note on the public build page too' }}
            onDecide={async (v) => {
              await decide.mutateAsync({ id: build.id, ...v });
              onDecided(v.decision);
            }}
          />
          {runs.data && runs.data.runs.length > 0 && (
            <PublishWithRuns
              buildId={build.id}
              title={build.title}
              edited={edited}
              runs={runs.data.runs}
              plan={runs.data.plan}
              onDone={() => onDecided('publish-with-runs')}
            />
          )}
        </div>
      }
    >
      <p>{build.summary}</p>
      <p className="text-sm text-ink-soft">
        {count(build.photoCount, 'photo')} · {count(build.entryCount, 'log entry', 'log entries')} ·{' '}
        {count(build.actuatorCount, 'actuator')} · {count(build.pendingRunCount, 'pending run')}
      </p>
      {full.isPending && (
        <p role="status" className="text-sm text-ink-soft">
          Loading the build…
        </p>
      )}
      {full.isError && (
        <p role="alert" className="text-sm text-danger">
          The build did not load: {full.error.message}
        </p>
      )}
      {history.isError && (
        <p role="alert" className="text-sm text-danger">
          The review history did not load: {history.error.message}
        </p>
      )}
      {history.data && <ReviewHistory history={history.data} edited={edited} />}
      {full.data && <BuildDetails build={full.data} />}
      <PanelSection title="Runs pending review">
        {runs.isPending && (
          <p role="status" className="text-sm text-ink-soft">
            Loading the runs…
          </p>
        )}
        {runs.isError && (
          <p role="alert" className="text-sm text-danger">
            The runs did not load: {runs.error.message}
          </p>
        )}
        {runs.data && <BuildRuns runs={runs.data.runs} />}
      </PanelSection>
      <div className="border-t border-rule pt-4">
        <ReviewThread buildId={build.id} side="moderator" />
      </div>
    </PanelFrame>
  );
}

function BuildDetails({ build }: { build: BuildDto }) {
  return (
    <>
      <Facts
        items={[
          ['Instrument', instrumentKindLabels[build.instrumentKind]],
          ['Stage', buildStageLabels[build.stage]],
          ['Started', formatDate(build.createdAt)],
        ]}
      />
      <PanelSection title="Photos">
        <BuildPhotos photos={build.photos} />
      </PanelSection>
      <PanelSection title="Write-up">
        {build.body.trim() ? (
          <div tabIndex={0} aria-label="Write-up" className="max-h-96 overflow-y-auto rounded-md border border-rule bg-white p-3">
            <Markdown>{build.body}</Markdown>
          </div>
        ) : (
          <p className="text-sm text-ink-soft">No write-up yet.</p>
        )}
      </PanelSection>
      {build.actuators.length > 0 && (
        <PanelSection title="Actuators">
          <ul className="space-y-1 text-sm">
            {build.actuators.map((a) => (
              <li key={a.id}>
                <span className="font-medium">{a.label ?? `${a.axis} axis`}</span>: {a.part.name} · {count(a.runs.length, 'run')},{' '}
                {a.runs.filter((r) => r.status === 'pending').length} pending
              </li>
            ))}
          </ul>
        </PanelSection>
      )}
      {build.entries.length > 0 && (
        <PanelSection title="Log entries">
          <ul className="list-disc space-y-0.5 pl-5 text-sm">
            {build.entries.map((e) => (
              <li key={e.id}>
                <span className="text-ink-soft">{formatDate(e.entryDate)}</span> {e.title}
              </li>
            ))}
          </ul>
        </PanelSection>
      )}
    </>
  );
}
