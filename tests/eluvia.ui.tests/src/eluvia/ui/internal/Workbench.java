package eluvia.ui.internal;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.e4.core.contexts.ContextInjectionFactory;
import org.eclipse.e4.core.contexts.EclipseContextFactory;
import org.eclipse.e4.core.contexts.IEclipseContext;
import org.eclipse.e4.core.di.suppliers.ExtendedObjectSupplier;
import org.eclipse.e4.core.internal.di.osgi.ProviderHelper;
import org.eclipse.e4.core.services.contributions.IContributionFactory;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.e4.ui.di.UISynchronize;
import org.eclipse.e4.ui.internal.workbench.E4Workbench;
import org.eclipse.e4.ui.internal.workbench.E4XMIResourceFactory;
import org.eclipse.e4.ui.internal.workbench.swt.E4Application;
import org.eclipse.e4.ui.internal.workbench.swt.PartRenderingEngine;
import org.eclipse.e4.ui.model.application.MAddon;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.basic.MWindow;
import org.eclipse.e4.ui.workbench.IWorkbench;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.e4.ui.workbench.swt.DisplayUISynchronize;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.Shell;

/**
 * The product's e4 workbench run in the test: the application model the product ships
 * (system property {@code eluvia.applicationModel}, set by the pom to
 * {@code bundles/eluvia.app/Application.e4xmi}), its add-ons, handlers, menus and parts, rendered
 * by the platform's SWT renderers, the way {@code E4Application} starts it (without the product's
 * command line, persisted state or styling). Menus are used as a user uses them: a menu is shown
 * (SWT.Show, which runs the menu's about-to-show processing and the dynamic contributions) and an
 * item selected (SWT.Selection, which runs the item's command through its handler).
 */
public final class Workbench implements AutoCloseable {

    public final Display display;
    public final IEclipseContext context;
    public final MApplication application;
    public final MWindow window;
    private final E4Workbench workbench;

    private Workbench() {
        display = Display.getDefault();
        Path model = Path.of(System.getProperty("eluvia.applicationModel", "../../bundles/eluvia.app/Application.e4xmi"))
                .toAbsolutePath().normalize();
        if (!Files.isRegularFile(model)) {
            throw new AssertionError("no application model at " + model + " (system property eluvia.applicationModel)");
        }
        context = E4Application.createDefaultContext();
        context.set(Display.class, display);
        context.set(UISynchronize.class, new DisplayUISynchronize(display));
        context.set(IWorkbench.PRESENTATION_URI_ARG, PartRenderingEngine.engineURI);
        ContextInjectionFactory.setDefault(context);
        // as the platform's own workbench tests do: the UI event supplier must use this context
        ExtendedObjectSupplier events = ProviderHelper.findProvider(UIEventTopic.class.getName(), null);
        ContextInjectionFactory.inject(events, context);

        URI uri = URI.createFileURI(model.toString());
        context.set(E4Workbench.INITIAL_WORKBENCH_MODEL_URI, uri);
        ResourceSet set = new ResourceSetImpl();
        set.getResourceFactoryRegistry().getExtensionToFactoryMap().put(Resource.Factory.Registry.DEFAULT_EXTENSION,
                new E4XMIResourceFactory());
        application = (MApplication) set.getResource(uri, true).getContents().get(0);
        application.setContext(context);
        context.set(MApplication.class, application);
        E4Application.initializeServices(application);
        IContributionFactory factory = context.get(IContributionFactory.class);
        IEclipseContext addonStatic = EclipseContextFactory.create();
        for (MAddon addon : application.getAddons()) {
            addonStatic.set(MAddon.class, addon);
            addon.setObject(factory.create(addon.getContributionURI(), context, addonStatic));
        }
        workbench = new E4Workbench(application, context);
        window = application.getChildren().get(0);
        workbench.createAndRunUI(window);
        shell().open();
        // the pointer off the window, so that no tooltip covers the pictures
        Rectangle screen = display.getBounds();
        display.setCursorLocation(screen.x + screen.width - 1, screen.y + screen.height - 1);
        flush();
    }

    /** Starts the workbench of the shipped application model. */
    public static Workbench start() {
        return new Workbench();
    }

    public Shell shell() {
        return (Shell) window.getWidget();
    }

    public EPartService parts() {
        return window.getContext().get(EPartService.class);
    }

    public EModelService models() {
        return context.get(EModelService.class);
    }

    /** Runs the pending events. */
    public void flush() {
        while (display.readAndDispatch()) {
            // pending events
        }
    }

    /** The item of a menu whose text (mnemonic marks and accelerator left out) starts with {@code label}. */
    public static MenuItem item(Menu menu, String label) {
        List<String> seen = new ArrayList<>();
        for (MenuItem i : menu.getItems()) {
            String text = plain(i.getText());
            if (text.startsWith(label)) {
                return i;
            }
            seen.add(text);
        }
        throw new AssertionError("no menu item \"" + label + "\" in " + seen);
    }

    /** A menu item's text as shown: without mnemonic marks and the accelerator. */
    public static String plain(String text) {
        int tab = text.indexOf('\t');
        String t = tab >= 0 ? text.substring(0, tab) : text;
        return t.replace("&&", "\u0000").replace("&", "").replace('\u0000', '&');
    }

    /** The texts of a menu's items as shown. */
    public static List<String> texts(Menu menu) {
        List<String> out = new ArrayList<>();
        for (MenuItem i : menu.getItems()) {
            out.add(plain(i.getText()));
        }
        return out;
    }

    /** Shows a menu of the menu bar (or a submenu of a shown menu): its items are brought up to date. */
    public Menu show(String... path) {
        Menu menu = shell().getMenuBar();
        for (String label : path) {
            menu = item(menu, label).getMenu();
            menu.notifyListeners(SWT.Show, new Event());
            flush();
        }
        return menu;
    }

    /** Hides a shown menu again. */
    public void hide(Menu menu) {
        menu.notifyListeners(SWT.Hide, new Event());
        flush();
    }

    /** Selects a menu item, as a click does, then runs the pending events. */
    public void select(MenuItem item) {
        if (!item.isEnabled()) {
            throw new AssertionError("menu item \"" + plain(item.getText()) + "\" is disabled");
        }
        item.notifyListeners(SWT.Selection, new Event());
        flush();
    }

    /**
     * Saves a picture of the screen where the workbench window is (menu bar and open menus
     * included) to {@code eluvia.screenshotDir} (if set) as {@code name.png}.
     */
    public void screenshot(String name) {
        String dir = System.getProperty("eluvia.screenshotDir");
        if (dir == null) {
            return;
        }
        flush();
        try {
            Files.createDirectories(Path.of(dir));
            Rectangle b = shell().getBounds();
            Rectangle screen = display.getBounds();
            Rectangle area = b.intersection(screen);
            Image image = new Image(display, area.width, area.height);
            GC gc = new GC(display);
            gc.copyArea(image, area.x, area.y);
            gc.dispose();
            ImageData data = image.getImageData();
            ImageLoader loader = new ImageLoader();
            loader.data = new ImageData[] { data };
            loader.save(Path.of(dir, name + ".png").toString(), SWT.IMAGE_PNG);
            image.dispose();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /**
     * Opens menus with the keyboard as a user does (Alt and the menu bar mnemonic, then the
     * mnemonics of submenus), saves a picture of the screen ({@link #screenshot}) and closes them
     * with Escape. Only for pictures: whether the window system shows the menus is not checked
     * here (the tests check menus through {@link #show}).
     *
     * @return whether the last menu opened was showing when the picture was taken
     */
    public boolean screenshotOfOpenMenus(String name, char barMnemonic, char... submenuMnemonics) {
        shell().forceActive();
        shell().setFocus();
        idle(200);
        key(SWT.ALT, true);
        key(barMnemonic, true);
        key(barMnemonic, false);
        key(SWT.ALT, false);
        idle(400);
        for (char c : submenuMnemonics) {
            key(c, true);
            key(c, false);
            idle(400);
        }
        Menu bar = shell().getMenuBar();
        boolean showing = false;
        for (MenuItem i : bar.getItems()) {
            showing |= i.getMenu() != null && i.getMenu().isVisible();
        }
        screenshot(name);
        for (int i = 0; i <= submenuMnemonics.length; i++) {
            key(SWT.ESC, true);
            key(SWT.ESC, false);
            idle(150);
        }
        return showing;
    }

    private void key(int keyCode, boolean down) {
        Event e = new Event();
        e.type = down ? SWT.KeyDown : SWT.KeyUp;
        if (keyCode == SWT.ALT) {
            e.keyCode = SWT.ALT;
        } else if (keyCode == SWT.ESC) {
            e.character = SWT.ESC;
            e.keyCode = SWT.ESC;
        } else {
            e.character = (char) keyCode;
            e.keyCode = keyCode;
        }
        display.post(e);
        flush();
    }

    /** Runs events for a while. */
    public void idle(long millis) {
        long end = System.currentTimeMillis() + millis;
        while (System.currentTimeMillis() < end) {
            if (!display.readAndDispatch()) {
                try {
                    Thread.sleep(5);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                }
            }
        }
    }

    @Override
    public void close() {
        try {
            workbench.close();
            flush();
        } finally {
            ExtendedObjectSupplier events = ProviderHelper.findProvider(UIEventTopic.class.getName(), null);
            ContextInjectionFactory.uninject(events, context);
            ContextInjectionFactory.setDefault(null);
            context.dispose();
        }
    }
}
