/**
 */
package eluvia.site.edit.provider;


import eluvia.site.model.ExcavationDesign;
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
 * This is the item provider adapter for a {@link eluvia.site.model.ExcavationDesign} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class ExcavationDesignItemProvider 
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
	public ExcavationDesignItemProvider(AdapterFactory adapterFactory) {
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
			addZonePropertyDescriptor(object);
			addSoilTypePropertyDescriptor(object);
			addSideSlopeHorizontalPerVerticalPropertyDescriptor(object);
			addOverdigMetresPropertyDescriptor(object);
			addTruckHeapedCapacityCubicMetresPropertyDescriptor(object);
			addTruckPayloadKilogramsPropertyDescriptor(object);
			addPriceBookPropertyDescriptor(object);
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
				 getString("_UI_ExcavationDesign_name_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExcavationDesign_name_feature", "_UI_ExcavationDesign_type"),
				 SitePackage.Literals.EXCAVATION_DESIGN__NAME,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Zone feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addZonePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ExcavationDesign_zone_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExcavationDesign_zone_feature", "_UI_ExcavationDesign_type"),
				 SitePackage.Literals.EXCAVATION_DESIGN__ZONE,
				 true,
				 false,
				 true,
				 null,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Soil Type feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSoilTypePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ExcavationDesign_soilType_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExcavationDesign_soilType_feature", "_UI_ExcavationDesign_type"),
				 SitePackage.Literals.EXCAVATION_DESIGN__SOIL_TYPE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Side Slope Horizontal Per Vertical feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSideSlopeHorizontalPerVerticalPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ExcavationDesign_sideSlopeHorizontalPerVertical_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExcavationDesign_sideSlopeHorizontalPerVertical_feature", "_UI_ExcavationDesign_type"),
				 SitePackage.Literals.EXCAVATION_DESIGN__SIDE_SLOPE_HORIZONTAL_PER_VERTICAL,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Overdig Metres feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addOverdigMetresPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ExcavationDesign_overdigMetres_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExcavationDesign_overdigMetres_feature", "_UI_ExcavationDesign_type"),
				 SitePackage.Literals.EXCAVATION_DESIGN__OVERDIG_METRES,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Truck Heaped Capacity Cubic Metres feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addTruckHeapedCapacityCubicMetresPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ExcavationDesign_truckHeapedCapacityCubicMetres_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExcavationDesign_truckHeapedCapacityCubicMetres_feature", "_UI_ExcavationDesign_type"),
				 SitePackage.Literals.EXCAVATION_DESIGN__TRUCK_HEAPED_CAPACITY_CUBIC_METRES,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Truck Payload Kilograms feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addTruckPayloadKilogramsPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ExcavationDesign_truckPayloadKilograms_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExcavationDesign_truckPayloadKilograms_feature", "_UI_ExcavationDesign_type"),
				 SitePackage.Literals.EXCAVATION_DESIGN__TRUCK_PAYLOAD_KILOGRAMS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Price Book feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addPriceBookPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_ExcavationDesign_priceBook_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_ExcavationDesign_priceBook_feature", "_UI_ExcavationDesign_type"),
				 SitePackage.Literals.EXCAVATION_DESIGN__PRICE_BOOK,
				 true,
				 false,
				 true,
				 null,
				 null,
				 null));
	}

	/**
	 * This returns ExcavationDesign.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/ExcavationDesign"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		String label = ((ExcavationDesign)object).getName();
		return label == null || label.length() == 0 ?
			getString("_UI_ExcavationDesign_type") :
			getString("_UI_ExcavationDesign_type") + " " + label;
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

		switch (notification.getFeatureID(ExcavationDesign.class)) {
			case SitePackage.EXCAVATION_DESIGN__NAME:
			case SitePackage.EXCAVATION_DESIGN__SOIL_TYPE:
			case SitePackage.EXCAVATION_DESIGN__SIDE_SLOPE_HORIZONTAL_PER_VERTICAL:
			case SitePackage.EXCAVATION_DESIGN__OVERDIG_METRES:
			case SitePackage.EXCAVATION_DESIGN__TRUCK_HEAPED_CAPACITY_CUBIC_METRES:
			case SitePackage.EXCAVATION_DESIGN__TRUCK_PAYLOAD_KILOGRAMS:
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
