/**
 */
package eluvia.site.edit.provider;


import eluvia.site.model.SitePackage;
import eluvia.site.model.ZoneAnalysisSettings;
import eluvia.site.model.ZoneEstimatorKind;

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
 * This is the item provider adapter for a {@link eluvia.site.model.ZoneAnalysisSettings} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class ZoneAnalysisSettingsItemProvider 
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
	public ZoneAnalysisSettingsItemProvider(AdapterFactory adapterFactory) {
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

			addEstimatorPropertyDescriptor(object);
			addNonDetectRulePropertyDescriptor(object);
			addInverseDistancePowerPropertyDescriptor(object);
			addMaximumNeighboursPropertyDescriptor(object);
			addSearchRadiusMetresPropertyDescriptor(object);
			addVerticalDistanceFactorPropertyDescriptor(object);
			addBlockPlanSizeMetresPropertyDescriptor(object);
			addBlockDepthMetresPropertyDescriptor(object);
			addVariogramModelPropertyDescriptor(object);
			addVariogramNuggetMgPerKgSquaredPropertyDescriptor(object);
			addVariogramSillMgPerKgSquaredPropertyDescriptor(object);
			addVariogramRangeMetresPropertyDescriptor(object);
			addDelayYearsPropertyDescriptor(object);
			addTransverseDispersivityFractionPropertyDescriptor(object);
			addHotSpotMultiplePropertyDescriptor(object);
		}
		return itemPropertyDescriptors;
	}

	/**
	 * This adds a property descriptor for the Estimator feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addEstimatorPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_estimator_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_estimator_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__ESTIMATOR,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Non Detect Rule feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addNonDetectRulePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_nonDetectRule_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_nonDetectRule_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__NON_DETECT_RULE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Inverse Distance Power feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addInverseDistancePowerPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_inverseDistancePower_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_inverseDistancePower_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__INVERSE_DISTANCE_POWER,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Maximum Neighbours feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMaximumNeighboursPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_maximumNeighbours_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_maximumNeighbours_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__MAXIMUM_NEIGHBOURS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Search Radius Metres feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSearchRadiusMetresPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_searchRadiusMetres_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_searchRadiusMetres_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__SEARCH_RADIUS_METRES,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Vertical Distance Factor feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addVerticalDistanceFactorPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_verticalDistanceFactor_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_verticalDistanceFactor_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__VERTICAL_DISTANCE_FACTOR,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Block Plan Size Metres feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addBlockPlanSizeMetresPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_blockPlanSizeMetres_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_blockPlanSizeMetres_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__BLOCK_PLAN_SIZE_METRES,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Block Depth Metres feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addBlockDepthMetresPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_blockDepthMetres_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_blockDepthMetres_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__BLOCK_DEPTH_METRES,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Variogram Model feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addVariogramModelPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_variogramModel_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_variogramModel_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_MODEL,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Variogram Nugget Mg Per Kg Squared feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addVariogramNuggetMgPerKgSquaredPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_variogramNuggetMgPerKgSquared_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_variogramNuggetMgPerKgSquared_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_NUGGET_MG_PER_KG_SQUARED,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Variogram Sill Mg Per Kg Squared feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addVariogramSillMgPerKgSquaredPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_variogramSillMgPerKgSquared_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_variogramSillMgPerKgSquared_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_SILL_MG_PER_KG_SQUARED,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Variogram Range Metres feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addVariogramRangeMetresPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_variogramRangeMetres_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_variogramRangeMetres_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_RANGE_METRES,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Delay Years feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDelayYearsPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_delayYears_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_delayYears_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__DELAY_YEARS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Transverse Dispersivity Fraction feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addTransverseDispersivityFractionPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_transverseDispersivityFraction_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_transverseDispersivityFraction_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__TRANSVERSE_DISPERSIVITY_FRACTION,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Hot Spot Multiple feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addHotSpotMultiplePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ZoneAnalysisSettings_hotSpotMultiple_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ZoneAnalysisSettings_hotSpotMultiple_feature", "_UI_ZoneAnalysisSettings_type"),
				 SitePackage.Literals.ZONE_ANALYSIS_SETTINGS__HOT_SPOT_MULTIPLE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns ZoneAnalysisSettings.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/ZoneAnalysisSettings"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		ZoneEstimatorKind labelValue = ((ZoneAnalysisSettings)object).getEstimator();
		String label = labelValue == null ? null : labelValue.toString();
		return label == null || label.length() == 0 ?
			getString("_UI_ZoneAnalysisSettings_type") :
			getString("_UI_ZoneAnalysisSettings_type") + " " + label;
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

		switch (notification.getFeatureID(ZoneAnalysisSettings.class)) {
			case SitePackage.ZONE_ANALYSIS_SETTINGS__ESTIMATOR:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__NON_DETECT_RULE:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__INVERSE_DISTANCE_POWER:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__MAXIMUM_NEIGHBOURS:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__SEARCH_RADIUS_METRES:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VERTICAL_DISTANCE_FACTOR:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__BLOCK_PLAN_SIZE_METRES:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__BLOCK_DEPTH_METRES:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_MODEL:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_NUGGET_MG_PER_KG_SQUARED:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_SILL_MG_PER_KG_SQUARED:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__VARIOGRAM_RANGE_METRES:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__DELAY_YEARS:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__TRANSVERSE_DISPERSIVITY_FRACTION:
			case SitePackage.ZONE_ANALYSIS_SETTINGS__HOT_SPOT_MULTIPLE:
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
