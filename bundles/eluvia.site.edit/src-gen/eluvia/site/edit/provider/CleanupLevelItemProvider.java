/**
 */
package eluvia.site.edit.provider;


import eluvia.site.model.CleanupLevel;
import eluvia.site.model.SitePackage;

import java.util.Collection;
import java.util.List;

import org.eclipse.emf.common.notify.AdapterFactory;
import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.ResourceLocator;

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
 * This is the item provider adapter for a {@link eluvia.site.model.CleanupLevel} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class CleanupLevelItemProvider 
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
	public CleanupLevelItemProvider(AdapterFactory adapterFactory) {
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

			addContaminantPropertyDescriptor(object);
			addSoilLevelMilligramsPerKgPropertyDescriptor(object);
			addBasisPropertyDescriptor(object);
			addSoilLevelEnteredPropertyDescriptor(object);
			addPorewaterLevelEnteredPropertyDescriptor(object);
			addPorewaterLevelMilligramsPerLitrePropertyDescriptor(object);
			addStatisticPropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Contaminant feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addContaminantPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_CleanupLevel_contaminant_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_CleanupLevel_contaminant_feature", "_UI_CleanupLevel_type"),
				 SitePackage.Literals.CLEANUP_LEVEL__CONTAMINANT,
				 true,
				 false,
				 true,
				 null,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Soil Level Milligrams Per Kg feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSoilLevelMilligramsPerKgPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_CleanupLevel_soilLevelMilligramsPerKg_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_CleanupLevel_soilLevelMilligramsPerKg_feature", "_UI_CleanupLevel_type"),
				 SitePackage.Literals.CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Basis feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addBasisPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_CleanupLevel_basis_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_CleanupLevel_basis_feature", "_UI_CleanupLevel_type"),
				 SitePackage.Literals.CLEANUP_LEVEL__BASIS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Soil Level Entered feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSoilLevelEnteredPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_CleanupLevel_soilLevelEntered_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_CleanupLevel_soilLevelEntered_feature", "_UI_CleanupLevel_type"),
				 SitePackage.Literals.CLEANUP_LEVEL__SOIL_LEVEL_ENTERED,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.BOOLEAN_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Porewater Level Entered feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addPorewaterLevelEnteredPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_CleanupLevel_porewaterLevelEntered_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_CleanupLevel_porewaterLevelEntered_feature", "_UI_CleanupLevel_type"),
				 SitePackage.Literals.CLEANUP_LEVEL__POREWATER_LEVEL_ENTERED,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.BOOLEAN_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Porewater Level Milligrams Per Litre feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addPorewaterLevelMilligramsPerLitrePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_CleanupLevel_porewaterLevelMilligramsPerLitre_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_CleanupLevel_porewaterLevelMilligramsPerLitre_feature", "_UI_CleanupLevel_type"),
				 SitePackage.Literals.CLEANUP_LEVEL__POREWATER_LEVEL_MILLIGRAMS_PER_LITRE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Statistic feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addStatisticPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_CleanupLevel_statistic_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_CleanupLevel_statistic_feature", "_UI_CleanupLevel_type"),
				 SitePackage.Literals.CLEANUP_LEVEL__STATISTIC,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns CleanupLevel.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/CleanupLevel"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		CleanupLevel cleanupLevel = (CleanupLevel)object;
		return getString("_UI_CleanupLevel_type") + " " + cleanupLevel.getSoilLevelMilligramsPerKg();
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

		switch (notification.getFeatureID(CleanupLevel.class)) {
			case SitePackage.CLEANUP_LEVEL__SOIL_LEVEL_MILLIGRAMS_PER_KG:
			case SitePackage.CLEANUP_LEVEL__BASIS:
			case SitePackage.CLEANUP_LEVEL__SOIL_LEVEL_ENTERED:
			case SitePackage.CLEANUP_LEVEL__POREWATER_LEVEL_ENTERED:
			case SitePackage.CLEANUP_LEVEL__POREWATER_LEVEL_MILLIGRAMS_PER_LITRE:
			case SitePackage.CLEANUP_LEVEL__STATISTIC:
				fireNotifyChanged(new ViewerNotification(notification, notification.getNotifier(), false, true));
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
