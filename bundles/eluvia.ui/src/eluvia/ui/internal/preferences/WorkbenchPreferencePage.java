package eluvia.ui.internal.preferences;

import org.eclipse.jface.preference.FieldEditorPreferencePage;
import org.eclipse.jface.preference.IntegerFieldEditor;
import org.eclipse.jface.preference.RadioGroupFieldEditor;

import eluvia.site.model.UnitSystem;
import eluvia.ui.internal.Messages;

/**
 * The preference page: the unit system numbers are shown and entered in (storage stays SI; the
 * conversion factors are those of eluvia.site.units, built from exact definitions) and the
 * autosave interval.
 */
public final class WorkbenchPreferencePage extends FieldEditorPreferencePage {

    public WorkbenchPreferencePage() {
        super(Messages.Preferences_pageTitle, GRID);
        setPreferenceStore(UiPreferences.store());
        setDescription(Messages.Preferences_description);
    }

    @Override
    protected void createFieldEditors() {
        addField(new RadioGroupFieldEditor(UiPreferences.UNIT_SYSTEM, Messages.Preferences_units, 1,
                new String[][] { { Messages.Preferences_si, UnitSystem.SI.getName() },
                        { Messages.Preferences_us, UnitSystem.US_CUSTOMARY.getName() } },
                getFieldEditorParent(), true));
        IntegerFieldEditor autosave = new IntegerFieldEditor(UiPreferences.AUTOSAVE_SECONDS, Messages.Preferences_autosave,
                getFieldEditorParent());
        autosave.setValidRange(0, UiPreferences.MAX_AUTOSAVE_SECONDS);
        autosave.setErrorMessage(Messages.bind(Messages.Preferences_autosaveRange, UiPreferences.MAX_AUTOSAVE_SECONDS));
        addField(autosave);
    }

    @Override
    public boolean performOk() {
        boolean ok = super.performOk();
        UiPreferences.save();
        return ok;
    }
}
