package eluvia.site.edit.command;

import org.eclipse.osgi.util.NLS;

/** Labels of the editing commands, from {@code messages.properties} beside this class. */
final class Messages extends NLS {

    private static final String BUNDLE_NAME = "eluvia.site.edit.command.messages";

    public static String Command_add;
    public static String Command_addMany;
    public static String Command_delete;
    public static String Command_deleteMany;
    public static String Command_set;

    static {
        NLS.initializeMessages(BUNDLE_NAME, Messages.class);
    }

    private Messages() {
    }
}
