/**
 */
package eluvia.site.edit.provider;


import eluvia.site.model.Project;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;

import java.util.Collection;
import java.util.List;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.ResourceLocator;

import org.eclipse.emf.ecore.EStructuralFeature;

import org.eclipse.emf.edit.provider.ComposeableAdapterFactory;
import org.eclipse.emf.edit.provider.IEditingDomainItemProvider;
import org.eclipse.emf.edit.provider.IItemLabelProvider;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.IItemPropertySource;
import org.eclipse.emf.edit.provider.IStructuredItemContentProvider;
import org.eclipse.emf.edit.provider.ITreeItemContentProvider;
import org.eclipse.emf.edit.provider.ItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.ItemProviderAdapter;
import org.eclipse.emf.edit.provider.ViewerNotification;

/**
 * This is the item provider adapter for a {@link eluvia.site.model.Project} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class ProjectItemProvider 
	extends ItemProviderAdapter
	implements
		IEditingDomainItemProvider,
		IStructuredItemContentProvider,
		ITreeItemContentProvider,
		IItemLabelProvider,
		IItemPropertySource {
	/**
	 * This constructs an instance from a factory and a notifier.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ProjectItemProvider(AdapterFactory adapterFactory) {
		super(adapterFactory);
	}

	/**
	 * This returns the property descriptors for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public List<IItemPropertyDescriptor> getPropertyDescriptors(Object object) {
		if (itemPropertyDescriptors == null) {
			super.getPropertyDescriptors(object);

			addNamePropertyDescriptor(object);
			addDescriptionPropertyDescriptor(object);
			addSchemaVersionPropertyDescriptor(object);
			addUnitSystemPropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Name feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addNamePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Project_name_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Project_name_feature", "_UI_Project_type"),
				 SitePackage.Literals.PROJECT__NAME,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Description feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDescriptionPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Project_description_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Project_description_feature", "_UI_Project_type"),
				 SitePackage.Literals.PROJECT__DESCRIPTION,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Schema Version feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSchemaVersionPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Project_schemaVersion_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Project_schemaVersion_feature", "_UI_Project_type"),
				 SitePackage.Literals.PROJECT__SCHEMA_VERSION,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Unit System feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addUnitSystemPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Project_unitSystem_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Project_unitSystem_feature", "_UI_Project_type"),
				 SitePackage.Literals.PROJECT__UNIT_SYSTEM,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This specifies how to implement {@link #getChildren} and is used to deduce an appropriate feature for an
	 * {@link org.eclipse.emf.edit.command.AddCommand}, {@link org.eclipse.emf.edit.command.RemoveCommand} or
	 * {@link org.eclipse.emf.edit.command.MoveCommand} in {@link #createCommand}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Collection<? extends EStructuralFeature> getChildrenFeatures(Object object) {
		if (childrenFeatures == null) {
			super.getChildrenFeatures(object);
			childrenFeatures.add(SitePackage.Literals.PROJECT__SITE);
			childrenFeatures.add(SitePackage.Literals.PROJECT__CONTAMINANTS);
			childrenFeatures.add(SitePackage.Literals.PROJECT__CLEANUP_LEVELS);
			childrenFeatures.add(SitePackage.Literals.PROJECT__FLUSHING_DESIGNS);
			childrenFeatures.add(SitePackage.Literals.PROJECT__REVISIONS);
			childrenFeatures.add(SitePackage.Literals.PROJECT__EXCAVATION_DESIGNS);
			childrenFeatures.add(SitePackage.Literals.PROJECT__PRICE_BOOKS);
			childrenFeatures.add(SitePackage.Literals.PROJECT__COLUMN_TESTS);
			childrenFeatures.add(SitePackage.Literals.PROJECT__UNCERTAINTY);
			childrenFeatures.add(SitePackage.Literals.PROJECT__ZONE_ANALYSIS);
		}
		return childrenFeatures;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EStructuralFeature getChildFeature(Object object, Object child) {
		// Check the type of the specified child object and return the proper feature to use for
		// adding (see {@link AddCommand}) it as a child.

		return super.getChildFeature(object, child);
	}

	/**
	 * This returns Project.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/Project"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		String label = ((Project)object).getName();
		return label == null || label.length() == 0 ?
			getString("_UI_Project_type") :
			getString("_UI_Project_type") + " " + label;
	}


	/**
	 * This handles model notifications by calling {@link #updateChildren} to update any cached
	 * children and by creating a viewer notification, which it passes to {@link #fireNotifyChanged}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void notifyChanged(Notification notification) {
		updateChildren(notification);

		switch (notification.getFeatureID(Project.class)) {
			case SitePackage.PROJECT__NAME:
			case SitePackage.PROJECT__DESCRIPTION:
			case SitePackage.PROJECT__SCHEMA_VERSION:
			case SitePackage.PROJECT__UNIT_SYSTEM:
				fireNotifyChanged(new ViewerNotification(notification, notification.getNotifier(), false, true));
				return;
			case SitePackage.PROJECT__SITE:
			case SitePackage.PROJECT__CONTAMINANTS:
			case SitePackage.PROJECT__CLEANUP_LEVELS:
			case SitePackage.PROJECT__FLUSHING_DESIGNS:
			case SitePackage.PROJECT__REVISIONS:
			case SitePackage.PROJECT__EXCAVATION_DESIGNS:
			case SitePackage.PROJECT__PRICE_BOOKS:
			case SitePackage.PROJECT__COLUMN_TESTS:
			case SitePackage.PROJECT__UNCERTAINTY:
			case SitePackage.PROJECT__ZONE_ANALYSIS:
				fireNotifyChanged(new ViewerNotification(notification, notification.getNotifier(), true, false));
				return;
		}
		super.notifyChanged(notification);
	}

	/**
	 * This adds {@link org.eclipse.emf.edit.command.CommandParameter}s describing the children
	 * that can be created under this object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected void collectNewChildDescriptors(Collection<Object> newChildDescriptors, Object object) {
		super.collectNewChildDescriptors(newChildDescriptors, object);

		newChildDescriptors.add
			(createChildParameter
				(SitePackage.Literals.PROJECT__SITE,
				 SiteFactory.eINSTANCE.createSite()));

		newChildDescriptors.add
			(createChildParameter
				(SitePackage.Literals.PROJECT__CONTAMINANTS,
				 SiteFactory.eINSTANCE.createContaminant()));

		newChildDescriptors.add
			(createChildParameter
				(SitePackage.Literals.PROJECT__CLEANUP_LEVELS,
				 SiteFactory.eINSTANCE.createCleanupLevel()));

		newChildDescriptors.add
			(createChildParameter
				(SitePackage.Literals.PROJECT__FLUSHING_DESIGNS,
				 SiteFactory.eINSTANCE.createFlushingDesign()));

		newChildDescriptors.add
			(createChildParameter
				(SitePackage.Literals.PROJECT__REVISIONS,
				 SiteFactory.eINSTANCE.createRevision()));

		newChildDescriptors.add
			(createChildParameter
				(SitePackage.Literals.PROJECT__EXCAVATION_DESIGNS,
				 SiteFactory.eINSTANCE.createExcavationDesign()));

		newChildDescriptors.add
			(createChildParameter
				(SitePackage.Literals.PROJECT__PRICE_BOOKS,
				 SiteFactory.eINSTANCE.createPriceBook()));

		newChildDescriptors.add
			(createChildParameter
				(SitePackage.Literals.PROJECT__COLUMN_TESTS,
				 SiteFactory.eINSTANCE.createColumnTest()));

		newChildDescriptors.add
			(createChildParameter
				(SitePackage.Literals.PROJECT__UNCERTAINTY,
				 SiteFactory.eINSTANCE.createUncertaintySettings()));

		newChildDescriptors.add
			(createChildParameter
				(SitePackage.Literals.PROJECT__ZONE_ANALYSIS,
				 SiteFactory.eINSTANCE.createZoneAnalysisSettings()));
	}

	/**
	 * Return the resource locator for this item provider's resources.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ResourceLocator getResourceLocator() {
		return SiteEditPlugin.INSTANCE;
	}

}
