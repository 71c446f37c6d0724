import { urlOf } from '@shared/api/endpoint';
import { photosApi } from '@shared/api/photos.api';
import type { ColourHistory, ConsultationView } from '@shared/schemas/consultation.schemas';
import { densityOptions, elasticityOptions, historyLabels, lengthOptions, porosityOptions, strandOptions } from './consultation-labels';

const labelOf = (options: { value: string; label: string }[], value: string) => options.find((o) => o.value === value)?.label ?? value;

/** The consultation as recorded, read-only, with its photos. */
export function ConsultationSummary({ view }: { view: ConsultationView }) {
  const c = view.consultation;
  const history = (Object.keys(historyLabels) as (keyof ColourHistory)[]).filter((k) => c.history[k]).map((k) => historyLabels[k]);
  const rows: [string, string][] = [
    ['Levels', `${c.currentLevel} now → ${c.targetLevel} wanted`],
    ['Colour history', history.join(', ') || '—'],
    ['Length and density', `${labelOf(lengthOptions, c.length)}, ${labelOf(densityOptions, c.density).toLowerCase()}`],
    ['Elasticity and porosity', `${labelOf(elasticityOptions, c.elasticity)}; ${labelOf(porosityOptions, c.porosity).toLowerCase()}`],
    ['Condition notes', c.conditionNotes || '—'],
    [
      'Strand test',
      labelOf(strandOptions, c.strandTest) +
        (view.strandTest !== c.strandTest
          ? `; the client card now says: ${labelOf(strandOptions, view.strandTest).toLowerCase()} (the quote follows this)`
          : ''),
    ],
    ['Vivid shade', c.vivid ? 'A vivid shade (direct dye) on top, placed in sections' : 'None'],
    ['Cut', c.wantsCut ? 'Cut and finish at the end' : 'No cut'],
    ['Notes', c.notes || '—'],
  ];
  return (
    <div className="flex flex-col gap-4">
      <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[max-content_1fr]">
        {rows.map(([term, value]) => (
          <div key={term} className="contents">
            <dt className="font-bold">{term}</dt>
            <dd className="whitespace-pre-line">{value}</dd>
          </div>
        ))}
      </dl>
      {view.photoIds.length > 0 && (
        <ul className="grid grid-cols-3 gap-3 sm:grid-cols-6" aria-label="Consultation photos">
          {view.photoIds.map((id, i) => (
            <li key={id}>
              <a
                href={urlOf(photosApi.file, { params: { id: id } })}
                target="_blank"
                rel="noreferrer"
                className="block overflow-hidden rounded-lg ring-1 ring-ink/10"
              >
                <img
                  src={urlOf(photosApi.file, { params: { id: id } })}
                  alt={`Hair at the consultation, ${i + 1} of ${view.photoIds.length}`}
                  loading="lazy"
                  className="aspect-square w-full object-cover"
                />
              </a>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
