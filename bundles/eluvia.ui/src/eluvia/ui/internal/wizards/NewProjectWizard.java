package eluvia.ui.internal.wizards;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

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
import org.eclipse.swt.widgets.Text;

import eluvia.design.Cautions;
import eluvia.site.files.ExampleProjects;
import eluvia.site.files.ProjectFileException;
import eluvia.site.files.ProjectFiles;
import eluvia.site.model.Project;
import eluvia.site.model.Site;
import eluvia.site.model.SiteFactory;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.preferences.UiPreferences;

/**
 * File > New Project...: a project file made blank (a site with no layers yet: the Problems view
 * then lists what to enter) or from the shipped, invented example, written to the chosen folder.
 */
public final class NewProjectWizard extends Wizard {

    private final Path defaultFolder;
    private ProjectPage page;
    private Path created;

    public NewProjectWizard(Path defaultFolder) {
        this.defaultFolder = defaultFolder;
        setWindowTitle(Messages.NewProject_title);
        setNeedsProgressMonitor(false);
    }

    @Override
    public void addPages() {
        page = new ProjectPage();
        addPage(page);
    }

    /** The file created by Finish, or null. */
    public Path created() {
        return created;
    }

    @Override
    public boolean performFinish() {
        Path file = page.file();
        try {
            created = create(page.name(), page.fromExample(), file);
            return true;
        } catch (IOException | ProjectFileException | RuntimeException e) {
            MessageDialog.openError(getShell(), Messages.NewProject_title,
                    Messages.bind(Messages.NewProject_failed, file, e.getMessage()));
            return false;
        }
    }

    /**
     * Writes a new project file.
     *
     * @param name the project's name
     * @param fromExample true to start from the shipped (invented) example, false for a blank project
     * @throws IOException when the file exists already or cannot be written
     */
    public static Path create(String name, boolean fromExample, Path file) throws IOException, ProjectFileException {
        if (Files.exists(file)) {
            throw new IOException(Messages.bind(Messages.NewProject_exists, file));
        }
        Project project;
        if (fromExample) {
            project = ExampleProjects.loadRiversideDepot();
            project.setName(name);
        } else {
            project = SiteFactory.eINSTANCE.createProject();
            project.setName(name);
            project.setUnitSystem(UiPreferences.unitSystem());
            Site site = SiteFactory.eINSTANCE.createSite();
            site.setName(name);
            project.setSite(site);
        }
        Files.createDirectories(file.toAbsolutePath().getParent());
        ProjectFiles.save(project, file);
        return file;
    }

    /** The wizard's one page. */
    private final class ProjectPage extends WizardPage {
        private Text nameText;
        private Text folderText;
        private Button blank;
        private Button example;
        private Label target;

        ProjectPage() {
            super("eluvia.ui.wizard.newProject.page");
            setTitle(Messages.NewProject_pageTitle);
            setDescription(Messages.NewProject_pageDescription);
        }

        @Override
        public void createControl(Composite parent) {
            Composite c = new Composite(parent, SWT.NONE);
            c.setLayout(new GridLayout(3, false));
            new Label(c, SWT.NONE).setText(Messages.NewProject_name);
            nameText = new Text(c, SWT.BORDER);
            nameText.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
            nameText.setText(Messages.NewProject_defaultName);
            new Label(c, SWT.NONE).setText(Messages.NewProject_folder);
            folderText = new Text(c, SWT.BORDER);
            folderText.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
            folderText.setText(defaultFolder.toString());
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
            new Label(c, SWT.NONE).setText(Messages.NewProject_start);
            blank = new Button(c, SWT.RADIO);
            blank.setText(Messages.NewProject_blank);
            blank.setSelection(true);
            blank.setLayoutData(new GridData(SWT.BEGINNING, SWT.CENTER, false, false, 2, 1));
            new Label(c, SWT.NONE);
            example = new Button(c, SWT.RADIO);
            example.setText(Messages.NewProject_example);
            example.setLayoutData(new GridData(SWT.BEGINNING, SWT.CENTER, false, false, 2, 1));
            new Label(c, SWT.NONE);
            Label caution = new Label(c, SWT.WRAP);
            caution.setText(Cautions.INVENTED_EXAMPLE);
            GridData cd = new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1);
            cd.widthHint = 420;
            caution.setLayoutData(cd);
            target = new Label(c, SWT.WRAP);
            GridData td = new GridData(SWT.FILL, SWT.TOP, true, false, 3, 1);
            td.widthHint = 480;
            td.verticalIndent = 10;
            target.setLayoutData(td);
            nameText.addModifyListener(e -> check());
            folderText.addModifyListener(e -> check());
            setControl(c);
            check();
        }

        String name() {
            return nameText.getText().trim();
        }

        boolean fromExample() {
            return example.getSelection();
        }

        Path file() {
            String base = name().replaceAll("[^A-Za-z0-9._ -]", "").trim().replace(' ', '-');
            if (base.isEmpty()) {
                base = "project";
            }
            return Path.of(folderText.getText().trim()).resolve(base + "." + ProjectFiles.EXTENSION);
        }

        private void check() {
            String error = null;
            if (name().isEmpty()) {
                error = Messages.NewProject_nameMissing;
            } else if (folderText.getText().isBlank()) {
                error = Messages.NewProject_folderMissing;
            } else if (Files.exists(file())) {
                error = Messages.bind(Messages.NewProject_exists, file());
            }
            target.setText(Messages.bind(Messages.NewProject_willCreate, file()));
            setErrorMessage(error);
            setPageComplete(error == null);
        }
    }
}
