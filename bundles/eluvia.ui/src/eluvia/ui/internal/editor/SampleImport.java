package eluvia.ui.internal.editor;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.jface.dialogs.Dialog;
import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;

import eluvia.site.model.SamplingLocation;
import eluvia.site.model.SitePackage;
import eluvia.site.sampling.ImportReport;
import eluvia.site.sampling.SampleCsvImport;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;

/**
 * The sampling page's CSV import (eluvia.site {@link SampleCsvImport}): reads the file, shows the
 * row report (every row not imported, with its line and the reason) and, when the user accepts,
 * adds the locations read to the site as one undoable edit.
 */
final class SampleImport {

    private final Bindings bindings;

    SampleImport(Bindings bindings) {
        this.bindings = bindings;
    }

    /** Adds the Import button to a button bar. */
    Button button(Composite bar) {
        Button b = new Button(bar, SWT.PUSH);
        b.setText(Messages.Sampling_import);
        b.setToolTipText(Messages.bind(Messages.Sampling_importColumns, String.join(", ", SampleCsvImport.COLUMNS)));
        b.addListener(SWT.Selection, e -> {
            FileDialog d = new FileDialog(bar.getShell(), SWT.OPEN);
            d.setText(Messages.Sampling_importTitle);
            d.setFilterExtensions(new String[] { "*.csv", "*" });
            String chosen = d.open();
            if (chosen != null) {
                importFile(bar.getShell(), Path.of(chosen), true);
            }
        });
        return b;
    }

    /** Reads a file into a report (nothing is changed yet). */
    ImportReport read(Path file) throws IOException {
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return SampleCsvImport.read(r, file.getFileName().toString(), bindings.document().project());
        }
    }

    /** The command adding a report's locations to the site. */
    Command command(ImportReport report) {
        List<SamplingLocation> locations = new ArrayList<>(report.locations());
        return AddCommand.create(bindings.document().domain(), bindings.document().project().getSite(),
                SitePackage.eINSTANCE.getSite_SamplingLocations(), locations);
    }

    /**
     * Imports a file: shows the report and adds the locations when the user accepts (or at once
     * when {@code ask} is false).
     *
     * @return the report, or null when the file could not be read
     */
    ImportReport importFile(Shell shell, Path file, boolean ask) {
        ImportReport report;
        try {
            report = read(file);
        } catch (IOException | RuntimeException e) {
            MessageDialog.openError(shell, Messages.Sampling_importTitle,
                    Messages.bind(Messages.Sampling_importFailed, file, e.getMessage()));
            return null;
        }
        boolean add = report.samplesImported() > 0 && (!ask || new ReportDialog(shell, report).open() == Dialog.OK);
        if (add) {
            bindings.execute(command(report));
        } else if (ask && report.samplesImported() == 0) {
            MessageDialog.openWarning(shell, Messages.Sampling_importTitle, report.summary());
        }
        return report;
    }

    /** Shows the row report and asks whether to add what was read. */
    private static final class ReportDialog extends Dialog {
        private final ImportReport report;

        ReportDialog(Shell shell, ImportReport report) {
            super(shell);
            this.report = report;
            setShellStyle(getShellStyle() | SWT.RESIZE);
        }

        @Override
        protected void configureShell(Shell shell) {
            super.configureShell(shell);
            shell.setText(Messages.Sampling_importTitle);
        }

        @Override
        protected Control createDialogArea(Composite parent) {
            Composite c = (Composite) super.createDialogArea(parent);
            Label l = new Label(c, SWT.WRAP);
            l.setText(Messages.bind(Messages.Sampling_importQuestion, report.samplesImported(), report.locations().size(),
                    report.rejected().size()));
            GridData ld = new GridData(SWT.FILL, SWT.TOP, true, false);
            ld.widthHint = 520;
            l.setLayoutData(ld);
            Text t = new Text(c, SWT.MULTI | SWT.READ_ONLY | SWT.BORDER | SWT.V_SCROLL | SWT.H_SCROLL);
            t.setText(report.summary());
            GridData td = new GridData(SWT.FILL, SWT.FILL, true, true);
            td.heightHint = t.getLineHeight() * 12;
            td.widthHint = 520;
            t.setLayoutData(td);
            return c;
        }

        @Override
        protected void createButtonsForButtonBar(Composite parent) {
            createButton(parent, IDialogConstants.OK_ID, Messages.Sampling_importAdd, true);
            createButton(parent, IDialogConstants.CANCEL_ID, IDialogConstants.CANCEL_LABEL, false);
        }
    }
}
