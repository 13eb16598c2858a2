package eluvia.site.edit.command;

import java.util.Collection;
import java.util.MissingResourceException;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CommandStack;
import org.eclipse.emf.common.command.CommandWrapper;
import org.eclipse.emf.common.command.UnexecutableCommand;
import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.emf.edit.command.CommandParameter;
import org.eclipse.emf.edit.command.DeleteCommand;
import org.eclipse.emf.edit.command.RemoveCommand;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.eclipse.emf.edit.provider.IItemLabelProvider;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.IItemPropertySource;

import eluvia.site.edit.provider.SiteEditPlugin;

/**
 * An editing domain whose Set, Add, Delete and Remove commands say what they change, so that an
 * Undo or Redo menu item can name the edit: "Set Darcy Flux Metres Per Day", "Add Soil Layer",
 * "Delete Soil Layer Topsoil". EMF.Edit's own commands are labelled only "Set", "Add" and so on.
 *
 * <p>The names come from the generated item providers (the feature's property descriptor, the
 * type and label texts of {@code plugin.properties}), so they follow the model. A caller that knows
 * a better name (an editor field with its unit shown) wraps the command with
 * {@link #labelled(String, Command)}.
 */
public class SiteEditingDomain extends AdapterFactoryEditingDomain {

    public SiteEditingDomain(AdapterFactory adapterFactory, CommandStack commandStack) {
        super(adapterFactory, commandStack);
    }

    @Override
    public Command createCommand(Class<? extends Command> commandClass, CommandParameter parameter) {
        Command command = super.createCommand(commandClass, parameter);
        if (command == null || command == UnexecutableCommand.INSTANCE) {
            return command;
        }
        String label = label(commandClass, parameter);
        return label == null ? command : labelled(label, command);
    }

    /**
     * A command that does what {@code command} does under another label (its description is the
     * label too).
     */
    public static Command labelled(String label, Command command) {
        return new CommandWrapper(label, label, command);
    }

    /** The label of a command of one of the kinds named here, or null to keep EMF's. */
    String label(Class<? extends Command> commandClass, CommandParameter parameter) {
        if (commandClass == SetCommand.class && parameter.getEOwner() != null && parameter.getEStructuralFeature() != null) {
            return Messages.bind(Messages.Command_set, featureName(parameter.getEOwner(), parameter.getEStructuralFeature()));
        }
        if (commandClass == AddCommand.class) {
            Collection<?> values = parameter.getCollection();
            if (values != null && !values.isEmpty()) {
                Object first = values.iterator().next();
                String type = typeName(first);
                return values.size() == 1 ? Messages.bind(Messages.Command_add, type)
                        : Messages.bind(Messages.Command_addMany, type, values.size());
            }
        }
        if (commandClass == DeleteCommand.class || commandClass == RemoveCommand.class) {
            Collection<?> values = parameter.getCollection();
            if (values != null && values.size() == 1) {
                return Messages.bind(Messages.Command_delete, text(values.iterator().next()));
            }
            if (values != null && values.size() > 1) {
                return Messages.bind(Messages.Command_deleteMany, values.size());
            }
        }
        return null;
    }

    /** The feature's name in the item provider's property sheet, or the feature's own name. */
    String featureName(EObject owner, EStructuralFeature feature) {
        if (getAdapterFactory().adapt(owner, IItemPropertySource.class) instanceof IItemPropertySource source) {
            IItemPropertyDescriptor d = source.getPropertyDescriptor(owner, feature);
            if (d != null && d.getDisplayName(owner) != null) {
                return d.getDisplayName(owner);
            }
        }
        return feature.getName();
    }

    /** The name of an object's type ({@code _UI_<Class>_type}), or its class name. */
    static String typeName(Object value) {
        if (value instanceof EObject e) {
            try {
                return SiteEditPlugin.INSTANCE.getString("_UI_" + e.eClass().getName() + "_type");
            } catch (MissingResourceException notOurs) {
                return e.eClass().getName();
            }
        }
        return String.valueOf(value);
    }

    /** The item provider's label of an object. */
    String text(Object value) {
        if (getAdapterFactory().adapt(value, IItemLabelProvider.class) instanceof IItemLabelProvider labels) {
            String t = labels.getText(value);
            if (t != null && !t.isBlank()) {
                return t;
            }
        }
        return typeName(value);
    }
}
