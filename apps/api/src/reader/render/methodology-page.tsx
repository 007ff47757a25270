import {
  type ReaderRating,
  type ReaderSite,
  type UpdateNoteKind,
  updateNoteKindLabels,
  updateNoteKinds,
} from '@skyledger/contracts';
import { likelihoodTerms } from '@skyledger/explainer';
import { DataTable } from './data-table.js';
import { scaleTop, siteHost } from './format.js';
import { Page, readerPaths, renderDocument } from './page.js';

export interface MethodologyPageInput {
  site: ReaderSite;
  /** The rating scale as it stands, in any order. */
  ratings: readonly ReaderRating[];
}

const noteMeanings: Record<UpdateNoteKind, string> = {
  correction:
    'we got a fact, a number or a source wrong, and say what was wrong and what is right.',
  clarification:
    'the facts stand, but we worded something in a way that could mislead, and reworded it.',
  update:
    'something new came to light, such as a new study or a reply from the person who made the claim.',
  rating_change:
    'the evidence led us to a different rating; the note gives the old rating and the reason.',
  retraction:
    'we no longer stand behind the explainer. The page stays, marked as retracted, with the reason.',
};

function MethodologyPage({ site, ratings }: MethodologyPageInput) {
  // From the best supported to the most contradicted, then outcomes that are not ratings.
  const scale = [...ratings].sort(
    (a, b) =>
      Number(b.isRating) - Number(a.isRating) ||
      Math.abs((a.number ?? 0) - a.bestRating) - Math.abs((b.number ?? 0) - b.bestRating),
  );
  const rated = scale.find((rating) => rating.isRating);
  const claimsAddress = `claims@${siteHost(site)}`;
  return (
    <Page
      site={site}
      title="How we check claims"
      description={`How the science desk of ${site.organisation} chooses and checks climate claims, what each rating means, and how we correct mistakes.`}
      section="methodology"
    >
      <h1>How we check climate claims</h1>
      <p>
        This page says how the science desk of {site.organisation} decides which claims to look at,
        how we test them, what our ratings mean and what we do when we get something wrong.
      </p>

      <h2 id="choosing">Which claims we check</h2>
      <ul>
        <li>
          Claims about the climate that many people meet, or that shape decisions in our area: said
          in public by officials, organisations and businesses, or shared widely online.
        </li>
        <li>
          Claims that evidence can test: measurements, physics and published research. Opinions,
          values and forecasts are not something we can rate; when a claim has nothing testable in
          it we say so rather than give it a rating.
        </li>
        <li>
          We check claims whatever side of a debate they come from, and we keep count of whom and
          what we check so that we can see if we lean one way.
        </li>
        <li>
          We do not name private individuals unless there is a strong public reason and the head of
          the desk agrees. Until then we give neither the address of what they wrote nor a copy of
          it, as either could name them.
        </li>
      </ul>

      <h2 id="checking">How we check a claim</h2>
      <ol>
        <li>
          We write the claim down as it was said, note who said it and where and when it appeared,
          and keep an archived copy. Our links go to that copy, marked so they give the original no
          boost in search results.
        </li>
        <li>We trace the claim back to the first place we can find it.</li>
        <li>
          We collect sources and grade how reliable each is, with a reason. Primary sources come
          first: peer-reviewed research, scientific assessment reports and the data of scientific
          agencies.
        </li>
        <li>
          Where numbers settle the question, we run a working: a short calculation from published
          values, every input shown with its source (see below).
        </li>
        <li>We ask the person or organisation behind the claim for their side, and wait for it.</li>
        <li>
          One editor drafts the rating and the explainer. A second editor, who did not write it,
          checks the primary source, the reply, the workings and any legal question before it is
          published.
        </li>
      </ol>

      <h2 id="ratings">What our ratings mean</h2>
      {rated ? (
        <p>
          Each rating has a number: {rated.bestRating} means the evidence supports the claim,{' '}
          {rated.worstRating} means the evidence contradicts it. Every page gives the rating in
          words with its number, never by colour alone.
        </p>
      ) : null}
      <dl>
        {scale.map((rating) => (
          <div key={rating.id}>
            <dt>
              {rating.isRating && rating.number !== null
                ? `${rating.number} of ${scaleTop(rating)}: ${rating.label}`
                : `${rating.label} (no number: not a rating)`}
            </dt>
            <dd>{rating.description}</dd>
          </div>
        ))}
      </dl>

      <h2 id="likelihood">How sure the science is: the words we use</h2>
      <p>
        When we say how likely something is, we use the likelihood words defined by the
        Intergovernmental Panel on Climate Change (IPCC), and we give the probability beside the
        word so that nobody has to guess what it means.
      </p>
      <DataTable
        caption="Likelihood words and the probability each stands for"
        columns={['Word', 'Probability']}
        rows={likelihoodTerms.map((entry) => [entry.term, `${entry.low}–${entry.high} %`])}
      />

      <h2 id="corrections">Corrections and updates</h2>
      <p>
        When an explainer changes after publication, we publish a dated note at the top of it, in
        our <a href={readerPaths.feed}>Atom feed</a> and on the{' '}
        <a href={readerPaths.corrections}>corrections page</a>. A new rating or verdict goes through
        the same independent check as the first one. Nothing we publish is deleted: every earlier
        version stays readable at its own address. Each note is one of these:
      </p>
      <dl>
        {updateNoteKinds.map((kind) => (
          <div key={kind}>
            <dt>{updateNoteKindLabels[kind]}</dt>
            <dd>This means {noteMeanings[kind]}</dd>
          </div>
        ))}
      </dl>
      <p>
        Any reader can ask for an e-mail when a particular explainer changes, from the form at the
        foot of it.
      </p>

      <h2 id="send">Send us a claim</h2>
      <p>
        Met a climate claim you would like checked, or think we got something wrong? E-mail{' '}
        <a className="url" href={`mailto:${claimsAddress}`}>
          {claimsAddress}
        </a>{' '}
        with what was said, who said it, and where and when (a link or a screenshot helps).
      </p>

      <h2 id="workings">What our workings can and cannot show</h2>
      <ul>
        <li>
          Workings are estimates on the back of an envelope: simple physics and statistics with
          published values. They are not the output of climate models.
        </li>
        <li>
          Each shows its inputs with their sources, every step, and the result. When an input is
          uncertain we run the calculation many times across its range and give the 5th to 95th
          percentile of the results.
        </li>
        <li>
          Each states the limits of its model. A working can show whether a claim is of the right
          size, for example whether a source of heat is big enough to matter; we weigh it beside
          published assessments and independent experts, which count for more.
        </li>
        <li>
          Our server recomputes every working from its inputs, so the numbers on the page are the
          ones the method gives.
        </li>
      </ul>
    </Page>
  );
}

/** How claims are chosen and checked, the ratings with their numbers, and the corrections policy. */
export function renderMethodologyPage(input: MethodologyPageInput): string {
  return renderDocument(<MethodologyPage {...input} />);
}
