/**
 */
package eluvia.site.edit.provider;


import eluvia.site.model.Contaminant;
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
 * This is the item provider adapter for a {@link eluvia.site.model.Contaminant} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class ContaminantItemProvider 
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
	public ContaminantItemProvider(AdapterFactory adapterFactory) {
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
			addCasNumberPropertyDescriptor(object);
			addKocLitresPerKgPropertyDescriptor(object);
			addKdEnteredPropertyDescriptor(object);
			addKdLitresPerKgPropertyDescriptor(object);
			addDiffusionSquareMetresPerSecondPropertyDescriptor(object);
			addHalfLifeDaysPropertyDescriptor(object);
			addIsothermPropertyDescriptor(object);
			addFreundlichKfMgPerKgPerMgPerLitreToNPropertyDescriptor(object);
			addFreundlichExponentPropertyDescriptor(object);
			addLangmuirMaximumMilligramsPerKgPropertyDescriptor(object);
			addLangmuirConstantLitresPerMilligramPropertyDescriptor(object);
			addWaterSolubilityMilligramsPerLitrePropertyDescriptor(object);
			addNonequilibriumPropertyDescriptor(object);
			addBetaPropertyDescriptor(object);
			addOmegaPropertyDescriptor(object);
			addMobileWaterFractionPropertyDescriptor(object);
			addMobileSiteFractionPropertyDescriptor(object);
			addMassTransferRatePerDayPropertyDescriptor(object);
			addPropertySourcePropertyDescriptor(object);
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
				 getString("_UI_Contaminant_name_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_name_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__NAME,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Cas Number feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addCasNumberPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_casNumber_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_casNumber_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__CAS_NUMBER,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Koc Litres Per Kg feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addKocLitresPerKgPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_kocLitresPerKg_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_kocLitresPerKg_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__KOC_LITRES_PER_KG,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Kd Entered feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addKdEnteredPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_kdEntered_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_kdEntered_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__KD_ENTERED,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.BOOLEAN_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Kd Litres Per Kg feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addKdLitresPerKgPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_kdLitresPerKg_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_kdLitresPerKg_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__KD_LITRES_PER_KG,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Diffusion Square Metres Per Second feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDiffusionSquareMetresPerSecondPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_diffusionSquareMetresPerSecond_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_diffusionSquareMetresPerSecond_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Half Life Days feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addHalfLifeDaysPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_halfLifeDays_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_halfLifeDays_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__HALF_LIFE_DAYS,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Isotherm feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addIsothermPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_isotherm_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_isotherm_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__ISOTHERM,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Freundlich Kf Mg Per Kg Per Mg Per Litre To N feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addFreundlichKfMgPerKgPerMgPerLitreToNPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_freundlichKfMgPerKgPerMgPerLitreToN_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_freundlichKfMgPerKgPerMgPerLitreToN_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Freundlich Exponent feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addFreundlichExponentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_freundlichExponent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_freundlichExponent_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__FREUNDLICH_EXPONENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Langmuir Maximum Milligrams Per Kg feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addLangmuirMaximumMilligramsPerKgPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_langmuirMaximumMilligramsPerKg_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_langmuirMaximumMilligramsPerKg_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Langmuir Constant Litres Per Milligram feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addLangmuirConstantLitresPerMilligramPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_langmuirConstantLitresPerMilligram_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_langmuirConstantLitresPerMilligram_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Water Solubility Milligrams Per Litre feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addWaterSolubilityMilligramsPerLitrePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_waterSolubilityMilligramsPerLitre_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_waterSolubilityMilligramsPerLitre_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Nonequilibrium feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addNonequilibriumPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_nonequilibrium_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_nonequilibrium_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__NONEQUILIBRIUM,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Beta feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addBetaPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_beta_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_beta_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__BETA,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Omega feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addOmegaPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_omega_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_omega_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__OMEGA,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Mobile Water Fraction feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMobileWaterFractionPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_mobileWaterFraction_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_mobileWaterFraction_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__MOBILE_WATER_FRACTION,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Mobile Site Fraction feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMobileSiteFractionPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_mobileSiteFraction_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_mobileSiteFraction_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__MOBILE_SITE_FRACTION,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Mass Transfer Rate Per Day feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addMassTransferRatePerDayPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_massTransferRatePerDay_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_massTransferRatePerDay_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__MASS_TRANSFER_RATE_PER_DAY,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Property Source feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addPropertySourcePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_Contaminant_propertySource_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_Contaminant_propertySource_feature", "_UI_Contaminant_type"),
				 SitePackage.Literals.CONTAMINANT__PROPERTY_SOURCE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This returns Contaminant.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/Contaminant"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		String label = ((Contaminant)object).getName();
		return label == null || label.length() == 0 ?
			getString("_UI_Contaminant_type") :
			getString("_UI_Contaminant_type") + " " + label;
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

		switch (notification.getFeatureID(Contaminant.class)) {
			case SitePackage.CONTAMINANT__NAME:
			case SitePackage.CONTAMINANT__CAS_NUMBER:
			case SitePackage.CONTAMINANT__KOC_LITRES_PER_KG:
			case SitePackage.CONTAMINANT__KD_ENTERED:
			case SitePackage.CONTAMINANT__KD_LITRES_PER_KG:
			case SitePackage.CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND:
			case SitePackage.CONTAMINANT__HALF_LIFE_DAYS:
			case SitePackage.CONTAMINANT__ISOTHERM:
			case SitePackage.CONTAMINANT__FREUNDLICH_KF_MG_PER_KG_PER_MG_PER_LITRE_TO_N:
			case SitePackage.CONTAMINANT__FREUNDLICH_EXPONENT:
			case SitePackage.CONTAMINANT__LANGMUIR_MAXIMUM_MILLIGRAMS_PER_KG:
			case SitePackage.CONTAMINANT__LANGMUIR_CONSTANT_LITRES_PER_MILLIGRAM:
			case SitePackage.CONTAMINANT__WATER_SOLUBILITY_MILLIGRAMS_PER_LITRE:
			case SitePackage.CONTAMINANT__NONEQUILIBRIUM:
			case SitePackage.CONTAMINANT__BETA:
			case SitePackage.CONTAMINANT__OMEGA:
			case SitePackage.CONTAMINANT__MOBILE_WATER_FRACTION:
			case SitePackage.CONTAMINANT__MOBILE_SITE_FRACTION:
			case SitePackage.CONTAMINANT__MASS_TRANSFER_RATE_PER_DAY:
			case SitePackage.CONTAMINANT__PROPERTY_SOURCE:
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
