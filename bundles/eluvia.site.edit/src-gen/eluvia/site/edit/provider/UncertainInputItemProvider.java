/**
 */
package eluvia.site.edit.provider;


import eluvia.site.model.SitePackage;
import eluvia.site.model.UncertainInput;

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
 * This is the item provider adapter for a {@link eluvia.site.model.UncertainInput} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class UncertainInputItemProvider 
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
	public UncertainInputItemProvider(AdapterFactory adapterFactory) {
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
			addTargetPropertyDescriptor(object);
			addFeatureNamePropertyDescriptor(object);
			addDistributionPropertyDescriptor(object);
			addMeanInFeatureUnitPropertyDescriptor(object);
			addStandardDeviationInFeatureUnitPropertyDescriptor(object);
			addMedianInFeatureUnitPropertyDescriptor(object);
			addGeometricStandardDeviationPropertyDescriptor(object);
			addMinimumInFeatureUnitPropertyDescriptor(object);
			addModeInFeatureUnitPropertyDescriptor(object);
			addMaximumInFeatureUnitPropertyDescriptor(object);
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
				 getString("_UI_UncertainInput_name_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_UncertainInput_name_feature", "_UI_UncertainInput_type"),
				 SitePackage.Literals.UNCERTAIN_INPUT__NAME,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Target feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addTargetPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_UncertainInput_target_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_UncertainInput_target_feature", "_UI_UncertainInput_type"),
				 SitePackage.Literals.UNCERTAIN_INPUT__TARGET,
				 true,
				 false,
				 true,
				 null,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Feature Name feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addFeatureNamePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_UncertainInput_featureName_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_UncertainInput_featureName_feature", "_UI_UncertainInput_type"),
				 SitePackage.Literals.UNCERTAIN_INPUT__FEATURE_NAME,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Distribution feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDistributionPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_UncertainInput_distribution_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_UncertainInput_distribution_feature", "_UI_UncertainInput_type"),
				 SitePackage.Literals.UNCERTAIN_INPUT__DISTRIBUTION,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Mean In Feature Unit feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMeanInFeatureUnitPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_UncertainInput_meanInFeatureUnit_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_UncertainInput_meanInFeatureUnit_feature", "_UI_UncertainInput_type"),
				 SitePackage.Literals.UNCERTAIN_INPUT__MEAN_IN_FEATURE_UNIT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Standard Deviation In Feature Unit feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addStandardDeviationInFeatureUnitPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_UncertainInput_standardDeviationInFeatureUnit_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_UncertainInput_standardDeviationInFeatureUnit_feature", "_UI_UncertainInput_type"),
				 SitePackage.Literals.UNCERTAIN_INPUT__STANDARD_DEVIATION_IN_FEATURE_UNIT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Median In Feature Unit feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMedianInFeatureUnitPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_UncertainInput_medianInFeatureUnit_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_UncertainInput_medianInFeatureUnit_feature", "_UI_UncertainInput_type"),
				 SitePackage.Literals.UNCERTAIN_INPUT__MEDIAN_IN_FEATURE_UNIT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Geometric Standard Deviation feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addGeometricStandardDeviationPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_UncertainInput_geometricStandardDeviation_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_UncertainInput_geometricStandardDeviation_feature", "_UI_UncertainInput_type"),
				 SitePackage.Literals.UNCERTAIN_INPUT__GEOMETRIC_STANDARD_DEVIATION,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Minimum In Feature Unit feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMinimumInFeatureUnitPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_UncertainInput_minimumInFeatureUnit_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_UncertainInput_minimumInFeatureUnit_feature", "_UI_UncertainInput_type"),
				 SitePackage.Literals.UNCERTAIN_INPUT__MINIMUM_IN_FEATURE_UNIT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Mode In Feature Unit feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addModeInFeatureUnitPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_UncertainInput_modeInFeatureUnit_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_UncertainInput_modeInFeatureUnit_feature", "_UI_UncertainInput_type"),
				 SitePackage.Literals.UNCERTAIN_INPUT__MODE_IN_FEATURE_UNIT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Maximum In Feature Unit feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMaximumInFeatureUnitPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_UncertainInput_maximumInFeatureUnit_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_UncertainInput_maximumInFeatureUnit_feature", "_UI_UncertainInput_type"),
				 SitePackage.Literals.UNCERTAIN_INPUT__MAXIMUM_IN_FEATURE_UNIT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns UncertainInput.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/UncertainInput"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		String label = ((UncertainInput)object).getName();
		return label == null || label.length() == 0 ?
			getString("_UI_UncertainInput_type") :
			getString("_UI_UncertainInput_type") + " " + label;
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

		switch (notification.getFeatureID(UncertainInput.class)) {
			case SitePackage.UNCERTAIN_INPUT__NAME:
			case SitePackage.UNCERTAIN_INPUT__FEATURE_NAME:
			case SitePackage.UNCERTAIN_INPUT__DISTRIBUTION:
			case SitePackage.UNCERTAIN_INPUT__MEAN_IN_FEATURE_UNIT:
			case SitePackage.UNCERTAIN_INPUT__STANDARD_DEVIATION_IN_FEATURE_UNIT:
			case SitePackage.UNCERTAIN_INPUT__MEDIAN_IN_FEATURE_UNIT:
			case SitePackage.UNCERTAIN_INPUT__GEOMETRIC_STANDARD_DEVIATION:
			case SitePackage.UNCERTAIN_INPUT__MINIMUM_IN_FEATURE_UNIT:
			case SitePackage.UNCERTAIN_INPUT__MODE_IN_FEATURE_UNIT:
			case SitePackage.UNCERTAIN_INPUT__MAXIMUM_IN_FEATURE_UNIT:
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
