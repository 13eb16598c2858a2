package eluvia.ui.internal.wizards;

import java.lang.reflect.InvocationTargetException;
import java.nio.file.Path;
import java.util.LinkedHashSet;
import java.util.Set;

import org.eclipse.core.runtime.OperationCanceledException;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.wizard.Wizard;
import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.DirectoryDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;

import eluvia.design.Cautions;
import eluvia.design.DesignRun;
import eluvia.report.PackageResult;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.ProjectDocument;

/**
 * File > Export Design Package...: the folder, which alternatives, whether to write the PDF; the
 * cautions that go into every package are shown before Finish. An unsaved project is saved first
 * so that the package's fingerprint names a file that exists.
 */
public final class ExportWizard extends Wizard {

    private final ProjectDocument document;
    private final DesignRun latestRun;
    private ExportPage page;
    private PackageResult written;

    /**
     * @param latestRun the latest results shown for the document, for the names of its alternatives (may be null)
     */
    public ExportWizard(ProjectDocument document, DesignRun latestRun) {
        this.document = document;
        this.latestRun = latestRun;
        setWindowTitle(Messages.Export_title);
        setNeedsProgressMonitor(true);
    }

    @Override
    public void addPages() {
        page = new ExportPage();
        addPage(page);
    }

    /** What Finish wrote, or null. */
    public PackageResult written() {
        return written;
    }

    @Override
    public boolean performFinish() {
        Path folder = page.folder();
        Set<String> chosen = page.chosen();
        boolean pdf = page.pdf();
        try {
            if (document.isDirty()) {
                document.save();
            }
            PackageResult[] out = new PackageResult[1];
            getContainer().run(true, true, monitor -> {
                try {
                    out[0] = DesignExport.export(document, folder, chosen, pdf, monitor);
                } catch (java.io.IOException e) {
                    throw new InvocationTargetException(e);
                } catch (OperationCanceledException e) {
                    throw new InterruptedException();
                }
            });
            written = out[0];
            return true;
        } catch (InterruptedException e) {
            return false;
        } catch (InvocationTargetException e) {
            Throwable t = e.getCause() == null ? e : e.getCause();
            MessageDialog.openError(getShell(), Messages.Export_title, Messages.bind(Messages.Export_failed, folder,
                    t.getMessage()));
            return false;
        } catch (java.io.IOException | RuntimeException e) {
            MessageDialog.openError(getShell(), Messages.Export_title, Messages.bind(Messages.Export_failed, folder,
                    e.getMessage()));
            return false;
        }
    }

    /** The wizard's one page. */
    private final class ExportPage extends WizardPage {
        private Text folderText;
        private Table alternatives;
        private Button pdfBox;

        ExportPage() {
            super("eluvia.ui.wizard.export.page");
            setTitle(Messages.Export_pageTitle);
            setDescription(Messages.Export_pageDescription);
        }

        @Override
        public void createControl(Composite parent) {
            Composite c = new Composite(parent, SWT.NONE);
            c.setLayout(new GridLayout(3, false));
            new Label(c, SWT.NONE).setText(Messages.Export_folder);
            folderText = new Text(c, SWT.BORDER);
            folderText.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
            String base = document.file().getFileName().toString().replaceFirst("\\.eluvia$", "");
            folderText.setText(document.file().resolveSibling(base + "-design-package").toString());
            Button browse = new Button(c, SWT.PUSH);
            browse.setText(Messages.Wizard_browse);
            browse.addListener(SWT.Selection, e -> {
                DirectoryDialog d = new DirectoryDialog(getShell());
                d.setFilterPath(folderText.getText());
                String chosen = d.open();
                if (chosen != null) {
                    folderText.setText(chosen);
                }
            });
            Label al = new Label(c, SWT.NONE);
            al.setText(Messages.Export_alternatives);
            al.setLayoutData(new GridData(SWT.BEGINNING, SWT.TOP, false, false));
            alternatives = new Table(c, SWT.CHECK | SWT.BORDER | SWT.V_SCROLL);
            GridData ad = new GridData(SWT.FILL, SWT.FILL, true, false, 2, 1);
            ad.heightHint = alternatives.getItemHeight() * 5;
            alternatives.setLayoutData(ad);
            for (String name : DesignExport.alternatives(document.project(), latestRun)) {
                TableItem item = new TableItem(alternatives, SWT.NONE);
                item.setText(name);
                item.setChecked(true);
            }
            alternatives.addListener(SWT.Selection, e -> check());
            new Label(c, SWT.NONE);
            pdfBox = new Button(c, SWT.CHECK);
            pdfBox.setText(Messages.Export_pdf);
            pdfBox.setSelection(true);
            pdfBox.setLayoutData(new GridData(SWT.BEGINNING, SWT.CENTER, false, false, 2, 1));
            if (document.isDirty()) {
                new Label(c, SWT.NONE);
                Label dirty = new Label(c, SWT.WRAP);
                dirty.setText(Messages.Export_willSave);
                dirty.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1));
            }
            Label cautionHead = new Label(c, SWT.NONE);
            cautionHead.setText(Messages.Export_cautions);
            cautionHead.setLayoutData(new GridData(SWT.BEGINNING, SWT.TOP, false, false, 3, 1));
            Text cautions = new Text(c, SWT.MULTI | SWT.WRAP | SWT.READ_ONLY | SWT.BORDER | SWT.V_SCROLL);
            GridData cd = new GridData(SWT.FILL, SWT.FILL, true, true, 3, 1);
            cd.widthHint = 520;
            cd.heightHint = cautions.getLineHeight() * 8;
            cautions.setLayoutData(cd);
            cautions.setText("\u26a0 " + String.join("\n\n\u26a0 ", Cautions.all()));
            folderText.addModifyListener(e -> check());
            setControl(c);
            check();
        }

        Path folder() {
            return Path.of(folderText.getText().trim());
        }

        Set<String> chosen() {
            Set<String> s = new LinkedHashSet<>();
            for (TableItem item : alternatives.getItems()) {
                if (item.getChecked()) {
                    s.add(item.getText());
                }
            }
            return s;
        }

        boolean pdf() {
            return pdfBox.getSelection();
        }

        private void check() {
            String error = null;
            if (folderText.getText().isBlank()) {
                error = Messages.Export_folderMissing;
            } else if (alternatives.getItemCount() > 0 && chosen().isEmpty()) {
                error = Messages.Export_noneChosen;
            }
            setErrorMessage(error);
            setPageComplete(error == null);
        }
    }
}
