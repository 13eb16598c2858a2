/**
 */
package eluvia.site.edit.provider;


import eluvia.site.model.PriceBook;
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
 * This is the item provider adapter for a {@link eluvia.site.model.PriceBook} object.
 * <!-- begin-user-doc -->
 * <!-- end-user-doc -->
 * @generated
 */
public class PriceBookItemProvider 
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
	public PriceBookItemProvider(AdapterFactory adapterFactory) {
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
			addCurrencyPropertyDescriptor(object);
			addReferencePropertyDescriptor(object);
			addScopeContingencyPercentPropertyDescriptor(object);
			addBidContingencyPercentPropertyDescriptor(object);
			addProjectManagementPercentPropertyDescriptor(object);
			addRemedialDesignPercentPropertyDescriptor(object);
			addConstructionManagementPercentPropertyDescriptor(object);
			addOperatingContingencyPercentPropertyDescriptor(object);
			addOperatingProjectManagementPercentPropertyDescriptor(object);
			addTechnicalSupportPercentPropertyDescriptor(object);
			addDiscountRatePercentPropertyDescriptor(object);
			addDiscountRateBasisPropertyDescriptor(object);
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
				 getString("_UI_PriceBook_name_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_name_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__NAME,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Currency feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addCurrencyPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PriceBook_currency_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_currency_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__CURRENCY,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Reference feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addReferencePropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PriceBook_reference_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_reference_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__REFERENCE,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.GENERIC_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Scope Contingency Percent feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addScopeContingencyPercentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PriceBook_scopeContingencyPercent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_scopeContingencyPercent_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__SCOPE_CONTINGENCY_PERCENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Bid Contingency Percent feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addBidContingencyPercentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PriceBook_bidContingencyPercent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_bidContingencyPercent_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__BID_CONTINGENCY_PERCENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Project Management Percent feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addProjectManagementPercentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PriceBook_projectManagementPercent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_projectManagementPercent_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__PROJECT_MANAGEMENT_PERCENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Remedial Design Percent feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addRemedialDesignPercentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PriceBook_remedialDesignPercent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_remedialDesignPercent_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__REMEDIAL_DESIGN_PERCENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Construction Management Percent feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addConstructionManagementPercentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PriceBook_constructionManagementPercent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_constructionManagementPercent_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__CONSTRUCTION_MANAGEMENT_PERCENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Operating Contingency Percent feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addOperatingContingencyPercentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PriceBook_operatingContingencyPercent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_operatingContingencyPercent_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__OPERATING_CONTINGENCY_PERCENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Operating Project Management Percent feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addOperatingProjectManagementPercentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PriceBook_operatingProjectManagementPercent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_operatingProjectManagementPercent_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__OPERATING_PROJECT_MANAGEMENT_PERCENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Technical Support Percent feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addTechnicalSupportPercentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PriceBook_technicalSupportPercent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_technicalSupportPercent_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__TECHNICAL_SUPPORT_PERCENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Discount Rate Percent feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDiscountRatePercentPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PriceBook_discountRatePercent_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_discountRatePercent_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__DISCOUNT_RATE_PERCENT,
				 true,
				 false,
				 false,
				 ItemPropertyDescriptor.REAL_VALUE_IMAGE,
				 null,
				 null));
	}

	/**
	 * This adds a property descriptor for the Discount Rate Basis feature.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void addDiscountRateBasisPropertyDescriptor(Object object) {
		itemPropertyDescriptors.add
			(createItemPropertyDescriptor
				(((ComposeableAdapterFactory)adapterFactory).getRootAdapterFactory(),
				 getResourceLocator(),
				 getString("_UI_PriceBook_discountRateBasis_feature"),
				 getString("_UI_PropertyDescriptor_description", "_UI_PriceBook_discountRateBasis_feature", "_UI_PriceBook_type"),
				 SitePackage.Literals.PRICE_BOOK__DISCOUNT_RATE_BASIS,
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
			childrenFeatures.add(SitePackage.Literals.PRICE_BOOK__ITEMS);
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
	 * This returns PriceBook.gif.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object getImage(Object object) {
		return overlayImage(object, getResourceLocator().getImage("full/obj16/PriceBook"));
	}

	/**
	 * This returns the label text for the adapted class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getText(Object object) {
		String label = ((PriceBook)object).getName();
		return label == null || label.length() == 0 ?
			getString("_UI_PriceBook_type") :
			getString("_UI_PriceBook_type") + " " + label;
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

		switch (notification.getFeatureID(PriceBook.class)) {
			case SitePackage.PRICE_BOOK__NAME:
			case SitePackage.PRICE_BOOK__CURRENCY:
			case SitePackage.PRICE_BOOK__REFERENCE:
			case SitePackage.PRICE_BOOK__SCOPE_CONTINGENCY_PERCENT:
			case SitePackage.PRICE_BOOK__BID_CONTINGENCY_PERCENT:
			case SitePackage.PRICE_BOOK__PROJECT_MANAGEMENT_PERCENT:
			case SitePackage.PRICE_BOOK__REMEDIAL_DESIGN_PERCENT:
			case SitePackage.PRICE_BOOK__CONSTRUCTION_MANAGEMENT_PERCENT:
			case SitePackage.PRICE_BOOK__OPERATING_CONTINGENCY_PERCENT:
			case SitePackage.PRICE_BOOK__OPERATING_PROJECT_MANAGEMENT_PERCENT:
			case SitePackage.PRICE_BOOK__TECHNICAL_SUPPORT_PERCENT:
			case SitePackage.PRICE_BOOK__DISCOUNT_RATE_PERCENT:
			case SitePackage.PRICE_BOOK__DISCOUNT_RATE_BASIS:
				fireNotifyChanged(new ViewerNotification(notification, notification.getNotifier(), false, true));
				return;
			case SitePackage.PRICE_BOOK__ITEMS:
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
				(SitePackage.Literals.PRICE_BOOK__ITEMS,
				 SiteFactory.eINSTANCE.createPriceItem()));
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
