/**
 * Notices about the draft itself: a conflict with another tab (choose which version to keep;
 * the other stays in the revisions), a newer version loaded from elsewhere, or the survey
 * being open in another tab too.
 */
import type { SurveyDraft } from '../../storage/index.js';
import { en as schemaMessages } from '../../../forms/index.js';
import { t } from '../../i18n/index.js';

export function DraftNotices({ draft }: { draft: SurveyDraft }) {
  return (
    <>
      {draft.conflict && (
        <div class="notice notice--alert" role="alert">
          <p>{draft.conflict.message}</p>
          <div class="button-row">
            <button
              type="button"
              class="button button--primary"
              onClick={() => void draft.keepMine()}
            >
              {t('survey.keepMine')}
            </button>
            <button type="button" class="button" onClick={() => void draft.takeTheirs()}>
              {t('survey.takeTheirs')}
            </button>
          </div>
        </div>
      )}
      {draft.updatedElsewhere && (
        <p class="notice" role="status">
          {schemaMessages.storage.updatedElsewhere}
        </p>
      )}
      {draft.otherTabs > 0 && !draft.conflict && (
        <p class="notice" role="status">
          {schemaMessages.storage.openElsewhere}
        </p>
      )}
    </>
  );
}
