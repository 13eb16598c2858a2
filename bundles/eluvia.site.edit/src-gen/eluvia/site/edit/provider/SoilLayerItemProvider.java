/**
 */
package eluvia.site.edit.provider;


import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;

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
 * This is the item provider adapter for a {@link eluvia.site.model.SoilLayer} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class SoilLayerItemProvider 
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
	public SoilLayerItemProvider(AdapterFactory adapterFactory) {
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
			addTopDepthMetresPropertyDescriptor(object);
			addBottomDepthMetresPropertyDescriptor(object);
			addTextureClassPropertyDescriptor(object);
			addBulkDensityKgPerCubicMetrePropertyDescriptor(object);
			addPorosityPropertyDescriptor(object);
			addWaterContentPropertyDescriptor(object);
			addOrganicCarbonFractionPropertyDescriptor(object);
			addSaturatedConductivityMetresPerDayPropertyDescriptor(object);
			addDispersivityMetresPropertyDescriptor(object);
			addSwellFactorPropertyDescriptor(object);
			addShrinkageFactorPropertyDescriptor(object);
			addDispersivityRulePropertyDescriptor(object);
			addDispersivityScaleMetresPropertyDescriptor(object);
			addEffectiveDispersivityMetresPropertyDescriptor(object);
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
				 getString("_UI_SoilLayer_name_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_name_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__NAME,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Top Depth Metres feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addTopDepthMetresPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_topDepthMetres_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_topDepthMetres_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__TOP_DEPTH_METRES,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Bottom Depth Metres feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addBottomDepthMetresPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_bottomDepthMetres_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_bottomDepthMetres_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__BOTTOM_DEPTH_METRES,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Texture Class feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addTextureClassPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_textureClass_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_textureClass_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__TEXTURE_CLASS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Bulk Density Kg Per Cubic Metre feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addBulkDensityKgPerCubicMetrePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_bulkDensityKgPerCubicMetre_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_bulkDensityKgPerCubicMetre_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__BULK_DENSITY_KG_PER_CUBIC_METRE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Porosity feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addPorosityPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_porosity_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_porosity_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__POROSITY,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Water Content feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addWaterContentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_waterContent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_waterContent_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__WATER_CONTENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Organic Carbon Fraction feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addOrganicCarbonFractionPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_organicCarbonFraction_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_organicCarbonFraction_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__ORGANIC_CARBON_FRACTION,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Saturated Conductivity Metres Per Day feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSaturatedConductivityMetresPerDayPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_saturatedConductivityMetresPerDay_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_saturatedConductivityMetresPerDay_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__SATURATED_CONDUCTIVITY_METRES_PER_DAY,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Dispersivity Metres feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDispersivityMetresPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_dispersivityMetres_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_dispersivityMetres_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__DISPERSIVITY_METRES,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Swell Factor feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSwellFactorPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_swellFactor_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_swellFactor_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__SWELL_FACTOR,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Shrinkage Factor feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addShrinkageFactorPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_shrinkageFactor_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_shrinkageFactor_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__SHRINKAGE_FACTOR,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Dispersivity Rule feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDispersivityRulePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_dispersivityRule_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_dispersivityRule_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__DISPERSIVITY_RULE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Dispersivity Scale Metres feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDispersivityScaleMetresPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_dispersivityScaleMetres_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_dispersivityScaleMetres_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__DISPERSIVITY_SCALE_METRES,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Effective Dispersivity Metres feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addEffectiveDispersivityMetresPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_SoilLayer_effectiveDispersivityMetres_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_SoilLayer_effectiveDispersivityMetres_feature", "_UI_SoilLayer_type"),
				 SitePackage.Literals.SOIL_LAYER__EFFECTIVE_DISPERSIVITY_METRES,
				 false,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns SoilLayer.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/SoilLayer"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		String label = ((SoilLayer)object).getName();
		return label == null || label.length() == 0 ?
			getString("_UI_SoilLayer_type") :
			getString("_UI_SoilLayer_type") + " " + label;
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

		switch (notification.getFeatureID(SoilLayer.class)) {
			case SitePackage.SOIL_LAYER__NAME:
			case SitePackage.SOIL_LAYER__TOP_DEPTH_METRES:
			case SitePackage.SOIL_LAYER__BOTTOM_DEPTH_METRES:
			case SitePackage.SOIL_LAYER__TEXTURE_CLASS:
			case SitePackage.SOIL_LAYER__BULK_DENSITY_KG_PER_CUBIC_METRE:
			case SitePackage.SOIL_LAYER__POROSITY:
			case SitePackage.SOIL_LAYER__WATER_CONTENT:
			case SitePackage.SOIL_LAYER__ORGANIC_CARBON_FRACTION:
			case SitePackage.SOIL_LAYER__SATURATED_CONDUCTIVITY_METRES_PER_DAY:
			case SitePackage.SOIL_LAYER__DISPERSIVITY_METRES:
			case SitePackage.SOIL_LAYER__SWELL_FACTOR:
			case SitePackage.SOIL_LAYER__SHRINKAGE_FACTOR:
			case SitePackage.SOIL_LAYER__DISPERSIVITY_RULE:
			case SitePackage.SOIL_LAYER__DISPERSIVITY_SCALE_METRES:
			case SitePackage.SOIL_LAYER__EFFECTIVE_DISPERSIVITY_METRES:
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
