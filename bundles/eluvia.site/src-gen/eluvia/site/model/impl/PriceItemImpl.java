/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.PriceItem;
import eluvia.site.model.SitePackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Price Item</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.PriceItemImpl#getCode <em>Code</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceItemImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceItemImpl#getUnit <em>Unit</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceItemImpl#getRatePerUnit <em>Rate Per Unit</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceItemImpl#getCurrency <em>Currency</em>}</li>
 *   <li>{@link eluvia.site.model.impl.PriceItemImpl#getSourceNote <em>Source Note</em>}</li>
 * </ul>
 *
 * @generated
 */
public class PriceItemImpl extends MinimalEObjectImpl.Container implements PriceItem {
	/**
	 * The default value of the '{@link #getCode() <em>Code</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCode()
	 * @generated
	 * @ordered
	 */
	protected static final String CODE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCode() <em>Code</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCode()
	 * @generated
	 * @ordered
	 */
	protected String code = CODE_EDEFAULT;

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
	 * The default value of the '{@link #getUnit() <em>Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnit()
	 * @generated
	 * @ordered
	 */
	protected static final String UNIT_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getUnit() <em>Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnit()
	 * @generated
	 * @ordered
	 */
	protected String unit = UNIT_EDEFAULT;

	/**
	 * The default value of the '{@link #getRatePerUnit() <em>Rate Per Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRatePerUnit()
	 * @generated
	 * @ordered
	 */
	protected static final double RATE_PER_UNIT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getRatePerUnit() <em>Rate Per Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRatePerUnit()
	 * @generated
	 * @ordered
	 */
	protected double ratePerUnit = RATE_PER_UNIT_EDEFAULT;

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
	 * The default value of the '{@link #getSourceNote() <em>Source Note</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSourceNote()
	 * @generated
	 * @ordered
	 */
	protected static final String SOURCE_NOTE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getSourceNote() <em>Source Note</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSourceNote()
	 * @generated
	 * @ordered
	 */
	protected String sourceNote = SOURCE_NOTE_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected PriceItemImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.PRICE_ITEM;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getCode() {
		return code;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCode(String newCode) {
		String oldCode = code;
		code = newCode;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_ITEM__CODE, oldCode, code));
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_ITEM__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getUnit() {
		return unit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUnit(String newUnit) {
		String oldUnit = unit;
		unit = newUnit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_ITEM__UNIT, oldUnit, unit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getRatePerUnit() {
		return ratePerUnit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRatePerUnit(double newRatePerUnit) {
		double oldRatePerUnit = ratePerUnit;
		ratePerUnit = newRatePerUnit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_ITEM__RATE_PER_UNIT, oldRatePerUnit, ratePerUnit));
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_ITEM__CURRENCY, oldCurrency, currency));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getSourceNote() {
		return sourceNote;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSourceNote(String newSourceNote) {
		String oldSourceNote = sourceNote;
		sourceNote = newSourceNote;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PRICE_ITEM__SOURCE_NOTE, oldSourceNote, sourceNote));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.PRICE_ITEM__CODE:
				return getCode();
			case SitePackage.PRICE_ITEM__NAME:
				return getName();
			case SitePackage.PRICE_ITEM__UNIT:
				return getUnit();
			case SitePackage.PRICE_ITEM__RATE_PER_UNIT:
				return getRatePerUnit();
			case SitePackage.PRICE_ITEM__CURRENCY:
				return getCurrency();
			case SitePackage.PRICE_ITEM__SOURCE_NOTE:
				return getSourceNote();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case SitePackage.PRICE_ITEM__CODE:
				setCode((String)newValue);
				return;
			case SitePackage.PRICE_ITEM__NAME:
				setName((String)newValue);
				return;
			case SitePackage.PRICE_ITEM__UNIT:
				setUnit((String)newValue);
				return;
			case SitePackage.PRICE_ITEM__RATE_PER_UNIT:
				setRatePerUnit((Double)newValue);
				return;
			case SitePackage.PRICE_ITEM__CURRENCY:
				setCurrency((String)newValue);
				return;
			case SitePackage.PRICE_ITEM__SOURCE_NOTE:
				setSourceNote((String)newValue);
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
			case SitePackage.PRICE_ITEM__CODE:
				setCode(CODE_EDEFAULT);
				return;
			case SitePackage.PRICE_ITEM__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.PRICE_ITEM__UNIT:
				setUnit(UNIT_EDEFAULT);
				return;
			case SitePackage.PRICE_ITEM__RATE_PER_UNIT:
				setRatePerUnit(RATE_PER_UNIT_EDEFAULT);
				return;
			case SitePackage.PRICE_ITEM__CURRENCY:
				setCurrency(CURRENCY_EDEFAULT);
				return;
			case SitePackage.PRICE_ITEM__SOURCE_NOTE:
				setSourceNote(SOURCE_NOTE_EDEFAULT);
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
			case SitePackage.PRICE_ITEM__CODE:
				return CODE_EDEFAULT == null ? code != null : !CODE_EDEFAULT.equals(code);
			case SitePackage.PRICE_ITEM__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.PRICE_ITEM__UNIT:
				return UNIT_EDEFAULT == null ? unit != null : !UNIT_EDEFAULT.equals(unit);
			case SitePackage.PRICE_ITEM__RATE_PER_UNIT:
				return ratePerUnit != RATE_PER_UNIT_EDEFAULT;
			case SitePackage.PRICE_ITEM__CURRENCY:
				return CURRENCY_EDEFAULT == null ? currency != null : !CURRENCY_EDEFAULT.equals(currency);
			case SitePackage.PRICE_ITEM__SOURCE_NOTE:
				return SOURCE_NOTE_EDEFAULT == null ? sourceNote != null : !SOURCE_NOTE_EDEFAULT.equals(sourceNote);
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
		result.append(" (code: ");
		result.append(code);
		result.append(", name: ");
		result.append(name);
		result.append(", unit: ");
		result.append(unit);
		result.append(", ratePerUnit: ");
		result.append(ratePerUnit);
		result.append(", currency: ");
		result.append(currency);
		result.append(", sourceNote: ");
		result.append(sourceNote);
		result.append(')');
		return result.toString();
	}

} //PriceItemImpl
