/**
 */
package eluvia.site.edit.provider;


import eluvia.site.model.FlushingDesign;
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
 * This is the item provider adapter for a {@link eluvia.site.model.FlushingDesign} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class FlushingDesignItemProvider 
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
	public FlushingDesignItemProvider(AdapterFactory adapterFactory) {
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
			addDarcyFluxMetresPerDayPropertyDescriptor(object);
			addOperatingDaysPerWeekPropertyDescriptor(object);
			addCaptureEfficiencyPropertyDescriptor(object);
			addCriterionPropertyDescriptor(object);
			addMaxPoreVolumesPropertyDescriptor(object);
			addSolutionMethodPropertyDescriptor(object);
			addNumericalCellCountPropertyDescriptor(object);
			addNumericalRelativeTolerancePropertyDescriptor(object);
			addMonitoringIntervalDaysPropertyDescriptor(object);
			addAmendmentNamePropertyDescriptor(object);
			addAmendmentDoseKilogramsPerCubicMetrePropertyDescriptor(object);
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
				 getString("_UI_FlushingDesign_name_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_name_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__NAME,
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
				 getString("_UI_FlushingDesign_zone_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_zone_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__ZONE,
				 true,
				 false,
				 true,
				 null,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Darcy Flux Metres Per Day feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDarcyFluxMetresPerDayPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_FlushingDesign_darcyFluxMetresPerDay_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_darcyFluxMetresPerDay_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__DARCY_FLUX_METRES_PER_DAY,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Operating Days Per Week feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addOperatingDaysPerWeekPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_FlushingDesign_operatingDaysPerWeek_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_operatingDaysPerWeek_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__OPERATING_DAYS_PER_WEEK,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Capture Efficiency feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addCaptureEfficiencyPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_FlushingDesign_captureEfficiency_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_captureEfficiency_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__CAPTURE_EFFICIENCY,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Criterion feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addCriterionPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_FlushingDesign_criterion_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_criterion_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__CRITERION,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Max Pore Volumes feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMaxPoreVolumesPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_FlushingDesign_maxPoreVolumes_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_maxPoreVolumes_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__MAX_PORE_VOLUMES,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Solution Method feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addSolutionMethodPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_FlushingDesign_solutionMethod_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_solutionMethod_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__SOLUTION_METHOD,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Numerical Cell Count feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addNumericalCellCountPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_FlushingDesign_numericalCellCount_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_numericalCellCount_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__NUMERICAL_CELL_COUNT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.INTEGRAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Numerical Relative Tolerance feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addNumericalRelativeTolerancePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_FlushingDesign_numericalRelativeTolerance_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_numericalRelativeTolerance_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__NUMERICAL_RELATIVE_TOLERANCE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Monitoring Interval Days feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMonitoringIntervalDaysPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_FlushingDesign_monitoringIntervalDays_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_monitoringIntervalDays_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__MONITORING_INTERVAL_DAYS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Amendment Name feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addAmendmentNamePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_FlushingDesign_amendmentName_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_amendmentName_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__AMENDMENT_NAME,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Amendment Dose Kilograms Per Cubic Metre feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addAmendmentDoseKilogramsPerCubicMetrePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_FlushingDesign_amendmentDoseKilogramsPerCubicMetre_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_amendmentDoseKilogramsPerCubicMetre_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE,
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
				 getString("_UI_FlushingDesign_priceBook_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_FlushingDesign_priceBook_feature", "_UI_FlushingDesign_type"),
				 SitePackage.Literals.FLUSHING_DESIGN__PRICE_BOOK,
				 true,
				 false,
				 true,
				 null,
				 null,
				 null));
	}

	/**
	 * This returns FlushingDesign.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/FlushingDesign"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		String label = ((FlushingDesign)object).getName();
		return label == null || label.length() == 0 ?
			getString("_UI_FlushingDesign_type") :
			getString("_UI_FlushingDesign_type") + " " + label;
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

		switch (notification.getFeatureID(FlushingDesign.class)) {
			case SitePackage.FLUSHING_DESIGN__NAME:
			case SitePackage.FLUSHING_DESIGN__DARCY_FLUX_METRES_PER_DAY:
			case SitePackage.FLUSHING_DESIGN__OPERATING_DAYS_PER_WEEK:
			case SitePackage.FLUSHING_DESIGN__CAPTURE_EFFICIENCY:
			case SitePackage.FLUSHING_DESIGN__CRITERION:
			case SitePackage.FLUSHING_DESIGN__MAX_PORE_VOLUMES:
			case SitePackage.FLUSHING_DESIGN__SOLUTION_METHOD:
			case SitePackage.FLUSHING_DESIGN__NUMERICAL_CELL_COUNT:
			case SitePackage.FLUSHING_DESIGN__NUMERICAL_RELATIVE_TOLERANCE:
			case SitePackage.FLUSHING_DESIGN__MONITORING_INTERVAL_DAYS:
			case SitePackage.FLUSHING_DESIGN__AMENDMENT_NAME:
			case SitePackage.FLUSHING_DESIGN__AMENDMENT_DOSE_KILOGRAMS_PER_CUBIC_METRE:
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
