package eluvia.ui.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.core.runtime.Platform;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.workbench.UIEvents;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.jface.dialogs.MessageDialogWithToggle;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.osgi.service.event.Event;

import eluvia.design.Cautions;
import eluvia.report.DesignPackage;
import eluvia.ui.ProjectEditors;
import jakarta.inject.Inject;

/**
 * Once the workbench is up: shows the cautions (until the user has acknowledged this text of
 * them), then opens any {@code .eluvia} files named on the command line.
 *
 * <p>Set the system property {@code eluvia.skipCautionDialog=true} to skip the dialog (tests,
 * screenshots); the cautions stay in every editor and in the Cautions view.
 */
public final class StartupAddon {

    static {
        // Charts and the design package are drawn off screen with AWT: keep AWT from opening a
        // display connection of its own beside SWT's.
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
    }

    @Inject
    private MApplication app;
    @Inject
    private EModelService models;

    @Inject
    @Optional
    public void started(@UIEventTopic(UIEvents.UILifeCycle.APP_STARTUP_COMPLETE) Event event, EPartService parts) {
        Display.getDefault().asyncExec(() -> {
            showCautionsOnce();
            for (String arg : Platform.getApplicationArgs()) {
                if (arg.endsWith(".eluvia") && Files.isRegularFile(Path.of(arg))) {
                    ProjectEditors.open(Path.of(arg), parts, models, app);
                }
            }
        });
    }

    /** The file recording which text of the cautions this user has acknowledged. */
    static Path acknowledgementFile() {
        return Path.of(System.getProperty("user.home"), ".eluvia", "cautions-acknowledged");
    }

    private static void showCautionsOnce() {
        if (Boolean.getBoolean("eluvia.skipCautionDialog")) {
            return;
        }
        String text = String.join("\n\n", Cautions.all());
        String stamp = DesignPackage.sha256(text.getBytes(StandardCharsets.UTF_8));
        Path ack = acknowledgementFile();
        try {
            if (Files.isRegularFile(ack) && Files.readString(ack).trim().equals(stamp)) {
                return;
            }
        } catch (IOException e) {
            // unreadable: show the cautions again
        }
        Shell shell = Display.getDefault().getActiveShell();
        MessageDialogWithToggle d = MessageDialogWithToggle.openInformation(shell, Messages.Startup_cautionsTitle,
                text, Messages.Startup_cautionsToggle, false, null, null);
        if (d.getToggleState()) {
            try {
                Files.createDirectories(ack.getParent());
                Files.writeString(ack, stamp + "\n");
            } catch (IOException e) {
                // cannot record it: the dialog will show again next time, which is safe
            }
        }
    }
}
