import { REACTION_CAUTION } from '@shared/schemas/hair-history.schemas';
import { Notice } from '@client/components/ui/notice';

/**
 * The usual caution beside the reaction question. It is always visible (people skim), and turns from a
 * note to a caution when the answer is yes.
 */
export function ReactionCaution({ emphasised }: { emphasised: boolean }) {
  return (
    <Notice tone={emphasised ? 'caution' : 'info'} title="Reactions to hair colour">
      <p>{REACTION_CAUTION}</p>
    </Notice>
  );
}
