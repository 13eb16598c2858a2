/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.PriceBook;
import eluvia.site.model.PriceItem;
import eluvia.site.model.SitePackage;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.InternalEList;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Price Book</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getCurrency <em>Currency</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getReference <em>Reference</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getItems <em>Items</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getScopeContingencyPercent <em>Scope Contingency Percent</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getBidContingencyPercent <em>Bid Contingency Percent</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getProjectManagementPercent <em>Project Management Percent</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getRemedialDesignPercent <em>Remedial Design Percent</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getConstructionManagementPercent <em>Construction Management Percent</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getOperatingContingencyPercent <em>Operating Contingency Percent</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getOperatingProjectManagementPercent <em>Operating Project Management Percent</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getTechnicalSupportPercent <em>Technical Support Percent</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getDiscountRatePercent <em>Discount Rate Percent</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceBookImpl#getDiscountRateBasis <em>Discount Rate Basis</em>}</li>
 * </ul>
 *
 * @generated
 */
public class PriceBookImpl extends MinimalEObjectImpl.Container implements PriceBook {
	/**
	 * The default value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected static final String NAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected String name = NAME_EDEFAULT;

	/**
	 * The default value of the '{@link #getCurrency() <em>Currency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCurrency()
	 * @generated
	 * @ordered
	 */
	protected static final String CURRENCY_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCurrency() <em>Currency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCurrency()
	 * @generated
	 * @ordered
	 */
	protected String currency = CURRENCY_EDEFAULT;

	/**
	 * The default value of the '{@link #getReference() <em>Reference</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReference()
	 * @generated
	 * @ordered
	 */
	protected static final String REFERENCE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getReference() <em>Reference</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getReference()
	 * @generated
	 * @ordered
	 */
	protected String reference = REFERENCE_EDEFAULT;

	/**
	 * The cached value of the '{@link #getItems() <em>Items</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getItems()
	 * @generated
	 * @ordered
	 */
	protected EList<PriceItem> items;

	/**
	 * The default value of the '{@link #getScopeContingencyPercent() <em>Scope Contingency Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getScopeContingencyPercent()
	 * @generated
	 * @ordered
	 */
	protected static final double SCOPE_CONTINGENCY_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getScopeContingencyPercent() <em>Scope Contingency Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getScopeContingencyPercent()
	 * @generated
	 * @ordered
	 */
	protected double scopeContingencyPercent = SCOPE_CONTINGENCY_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getBidContingencyPercent() <em>Bid Contingency Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBidContingencyPercent()
	 * @generated
	 * @ordered
	 */
	protected static final double BID_CONTINGENCY_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getBidContingencyPercent() <em>Bid Contingency Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBidContingencyPercent()
	 * @generated
	 * @ordered
	 */
	protected double bidContingencyPercent = BID_CONTINGENCY_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getProjectManagementPercent() <em>Project Management Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getProjectManagementPercent()
	 * @generated
	 * @ordered
	 */
	protected static final double PROJECT_MANAGEMENT_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getProjectManagementPercent() <em>Project Management Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getProjectManagementPercent()
	 * @generated
	 * @ordered
	 */
	protected double projectManagementPercent = PROJECT_MANAGEMENT_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getRemedialDesignPercent() <em>Remedial Design Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRemedialDesignPercent()
	 * @generated
	 * @ordered
	 */
	protected static final double REMEDIAL_DESIGN_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getRemedialDesignPercent() <em>Remedial Design Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRemedialDesignPercent()
	 * @generated
	 * @ordered
	 */
	protected double remedialDesignPercent = REMEDIAL_DESIGN_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getConstructionManagementPercent() <em>Construction Management Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getConstructionManagementPercent()
	 * @generated
	 * @ordered
	 */
	protected static final double CONSTRUCTION_MANAGEMENT_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getConstructionManagementPercent() <em>Construction Management Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getConstructionManagementPercent()
	 * @generated
	 * @ordered
	 */
	protected double constructionManagementPercent = CONSTRUCTION_MANAGEMENT_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getOperatingContingencyPercent() <em>Operating Contingency Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOperatingContingencyPercent()
	 * @generated
	 * @ordered
	 */
	protected static final double OPERATING_CONTINGENCY_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getOperatingContingencyPercent() <em>Operating Contingency Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOperatingContingencyPercent()
	 * @generated
	 * @ordered
	 */
	protected double operatingContingencyPercent = OPERATING_CONTINGENCY_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getOperatingProjectManagementPercent() <em>Operating Project Management Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOperatingProjectManagementPercent()
	 * @generated
	 * @ordered
	 */
	protected static final double OPERATING_PROJECT_MANAGEMENT_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getOperatingProjectManagementPercent() <em>Operating Project Management Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOperatingProjectManagementPercent()
	 * @generated
	 * @ordered
	 */
	protected double operatingProjectManagementPercent = OPERATING_PROJECT_MANAGEMENT_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getTechnicalSupportPercent() <em>Technical Support Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTechnicalSupportPercent()
	 * @generated
	 * @ordered
	 */
	protected static final double TECHNICAL_SUPPORT_PERCENT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTechnicalSupportPercent() <em>Technical Support Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTechnicalSupportPercent()
	 * @generated
	 * @ordered
	 */
	protected double technicalSupportPercent = TECHNICAL_SUPPORT_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getDiscountRatePercent() <em>Discount Rate Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDiscountRatePercent()
	 * @generated
	 * @ordered
	 */
	protected static final double DISCOUNT_RATE_PERCENT_EDEFAULT = 7.0;

	/**
	 * The cached value of the '{@link #getDiscountRatePercent() <em>Discount Rate Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDiscountRatePercent()
	 * @generated
	 * @ordered
	 */
	protected double discountRatePercent = DISCOUNT_RATE_PERCENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getDiscountRateBasis() <em>Discount Rate Basis</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDiscountRateBasis()
	 * @generated
	 * @ordered
	 */
	protected static final String DISCOUNT_RATE_BASIS_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getDiscountRateBasis() <em>Discount Rate Basis</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDiscountRateBasis()
	 * @generated
	 * @ordered
	 */
	protected String discountRateBasis = DISCOUNT_RATE_BASIS_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected PriceBookImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.PRICE_BOOK;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
		return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setName(String newName) {
		String oldName = name;
		name = newName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getCurrency() {
		return currency;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCurrency(String newCurrency) {
		String oldCurrency = currency;
		currency = newCurrency;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__CURRENCY, oldCurrency, currency));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getReference() {
		return reference;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setReference(String newReference) {
		String oldReference = reference;
		reference = newReference;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__REFERENCE, oldReference, reference));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<PriceItem> getItems() {
		if (items == null) {
			items = new EObjectContainmentEList<PriceItem>(PriceItem.class, this, SitePackage.PRICE_BOOK__ITEMS);
		}
		return items;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getScopeContingencyPercent() {
		return scopeContingencyPercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setScopeContingencyPercent(double newScopeContingencyPercent) {
		double oldScopeContingencyPercent = scopeContingencyPercent;
		scopeContingencyPercent = newScopeContingencyPercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__SCOPE_CONTINGENCY_PERCENT, oldScopeContingencyPercent, scopeContingencyPercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getBidContingencyPercent() {
		return bidContingencyPercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBidContingencyPercent(double newBidContingencyPercent) {
		double oldBidContingencyPercent = bidContingencyPercent;
		bidContingencyPercent = newBidContingencyPercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__BID_CONTINGENCY_PERCENT, oldBidContingencyPercent, bidContingencyPercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getProjectManagementPercent() {
		return projectManagementPercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setProjectManagementPercent(double newProjectManagementPercent) {
		double oldProjectManagementPercent = projectManagementPercent;
		projectManagementPercent = newProjectManagementPercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__PROJECT_MANAGEMENT_PERCENT, oldProjectManagementPercent, projectManagementPercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getRemedialDesignPercent() {
		return remedialDesignPercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRemedialDesignPercent(double newRemedialDesignPercent) {
		double oldRemedialDesignPercent = remedialDesignPercent;
		remedialDesignPercent = newRemedialDesignPercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__REMEDIAL_DESIGN_PERCENT, oldRemedialDesignPercent, remedialDesignPercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getConstructionManagementPercent() {
		return constructionManagementPercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setConstructionManagementPercent(double newConstructionManagementPercent) {
		double oldConstructionManagementPercent = constructionManagementPercent;
		constructionManagementPercent = newConstructionManagementPercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__CONSTRUCTION_MANAGEMENT_PERCENT, oldConstructionManagementPercent, constructionManagementPercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getOperatingContingencyPercent() {
		return operatingContingencyPercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOperatingContingencyPercent(double newOperatingContingencyPercent) {
		double oldOperatingContingencyPercent = operatingContingencyPercent;
		operatingContingencyPercent = newOperatingContingencyPercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__OPERATING_CONTINGENCY_PERCENT, oldOperatingContingencyPercent, operatingContingencyPercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getOperatingProjectManagementPercent() {
		return operatingProjectManagementPercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOperatingProjectManagementPercent(double newOperatingProjectManagementPercent) {
		double oldOperatingProjectManagementPercent = operatingProjectManagementPercent;
		operatingProjectManagementPercent = newOperatingProjectManagementPercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__OPERATING_PROJECT_MANAGEMENT_PERCENT, oldOperatingProjectManagementPercent, operatingProjectManagementPercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTechnicalSupportPercent() {
		return technicalSupportPercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTechnicalSupportPercent(double newTechnicalSupportPercent) {
		double oldTechnicalSupportPercent = technicalSupportPercent;
		technicalSupportPercent = newTechnicalSupportPercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__TECHNICAL_SUPPORT_PERCENT, oldTechnicalSupportPercent, technicalSupportPercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDiscountRatePercent() {
		return discountRatePercent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDiscountRatePercent(double newDiscountRatePercent) {
		double oldDiscountRatePercent = discountRatePercent;
		discountRatePercent = newDiscountRatePercent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__DISCOUNT_RATE_PERCENT, oldDiscountRatePercent, discountRatePercent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getDiscountRateBasis() {
		return discountRateBasis;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDiscountRateBasis(String newDiscountRateBasis) {
		String oldDiscountRateBasis = discountRateBasis;
		discountRateBasis = newDiscountRateBasis;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_BOOK__DISCOUNT_RATE_BASIS, oldDiscountRateBasis, discountRateBasis));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case SitePackage.PRICE_BOOK__ITEMS:
				return ((InternalEList<?>)getItems()).basicRemove(otherEnd, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.PRICE_BOOK__NAME:
				return getName();
			case SitePackage.PRICE_BOOK__CURRENCY:
				return getCurrency();
			case SitePackage.PRICE_BOOK__REFERENCE:
				return getReference();
			case SitePackage.PRICE_BOOK__ITEMS:
				return getItems();
			case SitePackage.PRICE_BOOK__SCOPE_CONTINGENCY_PERCENT:
				return getScopeContingencyPercent();
			case SitePackage.PRICE_BOOK__BID_CONTINGENCY_PERCENT:
				return getBidContingencyPercent();
			case SitePackage.PRICE_BOOK__PROJECT_MANAGEMENT_PERCENT:
				return getProjectManagementPercent();
			case SitePackage.PRICE_BOOK__REMEDIAL_DESIGN_PERCENT:
				return getRemedialDesignPercent();
			case SitePackage.PRICE_BOOK__CONSTRUCTION_MANAGEMENT_PERCENT:
				return getConstructionManagementPercent();
			case SitePackage.PRICE_BOOK__OPERATING_CONTINGENCY_PERCENT:
				return getOperatingContingencyPercent();
			case SitePackage.PRICE_BOOK__OPERATING_PROJECT_MANAGEMENT_PERCENT:
				return getOperatingProjectManagementPercent();
			case SitePackage.PRICE_BOOK__TECHNICAL_SUPPORT_PERCENT:
				return getTechnicalSupportPercent();
			case SitePackage.PRICE_BOOK__DISCOUNT_RATE_PERCENT:
				return getDiscountRatePercent();
			case SitePackage.PRICE_BOOK__DISCOUNT_RATE_BASIS:
				return getDiscountRateBasis();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@SuppressWarnings("unchecked")
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case SitePackage.PRICE_BOOK__NAME:
				setName((String)newValue);
				return;
			case SitePackage.PRICE_BOOK__CURRENCY:
				setCurrency((String)newValue);
				return;
			case SitePackage.PRICE_BOOK__REFERENCE:
				setReference((String)newValue);
				return;
			case SitePackage.PRICE_BOOK__ITEMS:
				getItems().clear();
				getItems().addAll((Collection<? extends PriceItem>)newValue);
				return;
			case SitePackage.PRICE_BOOK__SCOPE_CONTINGENCY_PERCENT:
				setScopeContingencyPercent((Double)newValue);
				return;
			case SitePackage.PRICE_BOOK__BID_CONTINGENCY_PERCENT:
				setBidContingencyPercent((Double)newValue);
				return;
			case SitePackage.PRICE_BOOK__PROJECT_MANAGEMENT_PERCENT:
				setProjectManagementPercent((Double)newValue);
				return;
			case SitePackage.PRICE_BOOK__REMEDIAL_DESIGN_PERCENT:
				setRemedialDesignPercent((Double)newValue);
				return;
			case SitePackage.PRICE_BOOK__CONSTRUCTION_MANAGEMENT_PERCENT:
				setConstructionManagementPercent((Double)newValue);
				return;
			case SitePackage.PRICE_BOOK__OPERATING_CONTINGENCY_PERCENT:
				setOperatingContingencyPercent((Double)newValue);
				return;
			case SitePackage.PRICE_BOOK__OPERATING_PROJECT_MANAGEMENT_PERCENT:
				setOperatingProjectManagementPercent((Double)newValue);
				return;
			case SitePackage.PRICE_BOOK__TECHNICAL_SUPPORT_PERCENT:
				setTechnicalSupportPercent((Double)newValue);
				return;
			case SitePackage.PRICE_BOOK__DISCOUNT_RATE_PERCENT:
				setDiscountRatePercent((Double)newValue);
				return;
			case SitePackage.PRICE_BOOK__DISCOUNT_RATE_BASIS:
				setDiscountRateBasis((String)newValue);
				return;
		}
		super.eSet(featureID, newValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eUnset(int featureID) {
		switch (featureID) {
			case SitePackage.PRICE_BOOK__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.PRICE_BOOK__CURRENCY:
				setCurrency(CURRENCY_EDEFAULT);
				return;
			case SitePackage.PRICE_BOOK__REFERENCE:
				setReference(REFERENCE_EDEFAULT);
				return;
			case SitePackage.PRICE_BOOK__ITEMS:
				getItems().clear();
				return;
			case SitePackage.PRICE_BOOK__SCOPE_CONTINGENCY_PERCENT:
				setScopeContingencyPercent(SCOPE_CONTINGENCY_PERCENT_EDEFAULT);
				return;
			case SitePackage.PRICE_BOOK__BID_CONTINGENCY_PERCENT:
				setBidContingencyPercent(BID_CONTINGENCY_PERCENT_EDEFAULT);
				return;
			case SitePackage.PRICE_BOOK__PROJECT_MANAGEMENT_PERCENT:
				setProjectManagementPercent(PROJECT_MANAGEMENT_PERCENT_EDEFAULT);
				return;
			case SitePackage.PRICE_BOOK__REMEDIAL_DESIGN_PERCENT:
				setRemedialDesignPercent(REMEDIAL_DESIGN_PERCENT_EDEFAULT);
				return;
			case SitePackage.PRICE_BOOK__CONSTRUCTION_MANAGEMENT_PERCENT:
				setConstructionManagementPercent(CONSTRUCTION_MANAGEMENT_PERCENT_EDEFAULT);
				return;
			case SitePackage.PRICE_BOOK__OPERATING_CONTINGENCY_PERCENT:
				setOperatingContingencyPercent(OPERATING_CONTINGENCY_PERCENT_EDEFAULT);
				return;
			case SitePackage.PRICE_BOOK__OPERATING_PROJECT_MANAGEMENT_PERCENT:
				setOperatingProjectManagementPercent(OPERATING_PROJECT_MANAGEMENT_PERCENT_EDEFAULT);
				return;
			case SitePackage.PRICE_BOOK__TECHNICAL_SUPPORT_PERCENT:
				setTechnicalSupportPercent(TECHNICAL_SUPPORT_PERCENT_EDEFAULT);
				return;
			case SitePackage.PRICE_BOOK__DISCOUNT_RATE_PERCENT:
				setDiscountRatePercent(DISCOUNT_RATE_PERCENT_EDEFAULT);
				return;
			case SitePackage.PRICE_BOOK__DISCOUNT_RATE_BASIS:
				setDiscountRateBasis(DISCOUNT_RATE_BASIS_EDEFAULT);
				return;
		}
		super.eUnset(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean eIsSet(int featureID) {
		switch (featureID) {
			case SitePackage.PRICE_BOOK__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.PRICE_BOOK__CURRENCY:
				return CURRENCY_EDEFAULT == null ? currency != null : !CURRENCY_EDEFAULT.equals(currency);
			case SitePackage.PRICE_BOOK__REFERENCE:
				return REFERENCE_EDEFAULT == null ? reference != null : !REFERENCE_EDEFAULT.equals(reference);
			case SitePackage.PRICE_BOOK__ITEMS:
				return items != null && !items.isEmpty();
			case SitePackage.PRICE_BOOK__SCOPE_CONTINGENCY_PERCENT:
				return scopeContingencyPercent != SCOPE_CONTINGENCY_PERCENT_EDEFAULT;
			case SitePackage.PRICE_BOOK__BID_CONTINGENCY_PERCENT:
				return bidContingencyPercent != BID_CONTINGENCY_PERCENT_EDEFAULT;
			case SitePackage.PRICE_BOOK__PROJECT_MANAGEMENT_PERCENT:
				return projectManagementPercent != PROJECT_MANAGEMENT_PERCENT_EDEFAULT;
			case SitePackage.PRICE_BOOK__REMEDIAL_DESIGN_PERCENT:
				return remedialDesignPercent != REMEDIAL_DESIGN_PERCENT_EDEFAULT;
			case SitePackage.PRICE_BOOK__CONSTRUCTION_MANAGEMENT_PERCENT:
				return constructionManagementPercent != CONSTRUCTION_MANAGEMENT_PERCENT_EDEFAULT;
			case SitePackage.PRICE_BOOK__OPERATING_CONTINGENCY_PERCENT:
				return operatingContingencyPercent != OPERATING_CONTINGENCY_PERCENT_EDEFAULT;
			case SitePackage.PRICE_BOOK__OPERATING_PROJECT_MANAGEMENT_PERCENT:
				return operatingProjectManagementPercent != OPERATING_PROJECT_MANAGEMENT_PERCENT_EDEFAULT;
			case SitePackage.PRICE_BOOK__TECHNICAL_SUPPORT_PERCENT:
				return technicalSupportPercent != TECHNICAL_SUPPORT_PERCENT_EDEFAULT;
			case SitePackage.PRICE_BOOK__DISCOUNT_RATE_PERCENT:
				return discountRatePercent != DISCOUNT_RATE_PERCENT_EDEFAULT;
			case SitePackage.PRICE_BOOK__DISCOUNT_RATE_BASIS:
				return DISCOUNT_RATE_BASIS_EDEFAULT == null ? discountRateBasis != null : !DISCOUNT_RATE_BASIS_EDEFAULT.equals(discountRateBasis);
		}
		return super.eIsSet(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		if (eIsProxy()) return super.toString();

		StringBuilder result = new StringBuilder(super.toString());
		result.append(" (name: ");
		result.append(name);
		result.append(", currency: ");
		result.append(currency);
		result.append(", reference: ");
		result.append(reference);
		result.append(", scopeContingencyPercent: ");
		result.append(scopeContingencyPercent);
		result.append(", bidContingencyPercent: ");
		result.append(bidContingencyPercent);
		result.append(", projectManagementPercent: ");
		result.append(projectManagementPercent);
		result.append(", remedialDesignPercent: ");
		result.append(remedialDesignPercent);
		result.append(", constructionManagementPercent: ");
		result.append(constructionManagementPercent);
		result.append(", operatingContingencyPercent: ");
		result.append(operatingContingencyPercent);
		result.append(", operatingProjectManagementPercent: ");
		result.append(operatingProjectManagementPercent);
		result.append(", technicalSupportPercent: ");
		result.append(technicalSupportPercent);
		result.append(", discountRatePercent: ");
		result.append(discountRatePercent);
		result.append(", discountRateBasis: ");
		result.append(discountRateBasis);
		result.append(')');
		return result.toString();
	}

} //PriceBookImpl
