package eluvia.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.jface.preference.PreferenceDialog;
import org.eclipse.jface.preference.PreferenceManager;
import org.eclipse.jface.preference.PreferenceNode;
import org.eclipse.swt.widgets.Shell;

import eluvia.ui.internal.Messages;
import eluvia.ui.internal.preferences.WorkbenchPreferencePage;

/** Edit > Preferences...: units shown and autosave interval. */
public final class PreferencesHandler {

    @Execute
    public void execute(Shell shell) {
        PreferenceManager manager = new PreferenceManager();
        PreferenceNode node = new PreferenceNode("eluvia.ui.preferences.workbench", new WorkbenchPreferencePage());
        manager.addToRoot(node);
        PreferenceDialog dialog = new PreferenceDialog(shell, manager);
        dialog.create();
        dialog.getShell().setText(Messages.Preferences_title);
        dialog.open();
    }
}
