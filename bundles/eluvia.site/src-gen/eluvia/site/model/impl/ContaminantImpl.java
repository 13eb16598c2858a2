/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.Contaminant;
import eluvia.site.model.SitePackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Contaminant</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getCasNumber <em>Cas Number</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getKocLitresPerKg <em>Koc Litres Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#isKdEntered <em>Kd Entered</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getKdLitresPerKg <em>Kd Litres Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getDiffusionSquareMetresPerSecond <em>Diffusion Square Metres Per Second</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ContaminantImpl#getHalfLifeDays <em>Half Life Days</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ContaminantImpl extends MinimalEObjectImpl.Container implements Contaminant {
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
	 * The default value of the '{@link #getCasNumber() <em>Cas Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCasNumber()
	 * @generated
	 * @ordered
	 */
	protected static final String CAS_NUMBER_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCasNumber() <em>Cas Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCasNumber()
	 * @generated
	 * @ordered
	 */
	protected String casNumber = CAS_NUMBER_EDEFAULT;

	/**
	 * The default value of the '{@link #getKocLitresPerKg() <em>Koc Litres Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKocLitresPerKg()
	 * @generated
	 * @ordered
	 */
	protected static final double KOC_LITRES_PER_KG_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getKocLitresPerKg() <em>Koc Litres Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKocLitresPerKg()
	 * @generated
	 * @ordered
	 */
	protected double kocLitresPerKg = KOC_LITRES_PER_KG_EDEFAULT;

	/**
	 * The default value of the '{@link #isKdEntered() <em>Kd Entered</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isKdEntered()
	 * @generated
	 * @ordered
	 */
	protected static final boolean KD_ENTERED_EDEFAULT = false;

	/**
	 * The cached value of the '{@link #isKdEntered() <em>Kd Entered</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isKdEntered()
	 * @generated
	 * @ordered
	 */
	protected boolean kdEntered = KD_ENTERED_EDEFAULT;

	/**
	 * The default value of the '{@link #getKdLitresPerKg() <em>Kd Litres Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKdLitresPerKg()
	 * @generated
	 * @ordered
	 */
	protected static final double KD_LITRES_PER_KG_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getKdLitresPerKg() <em>Kd Litres Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKdLitresPerKg()
	 * @generated
	 * @ordered
	 */
	protected double kdLitresPerKg = KD_LITRES_PER_KG_EDEFAULT;

	/**
	 * The default value of the '{@link #getDiffusionSquareMetresPerSecond() <em>Diffusion Square Metres Per Second</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDiffusionSquareMetresPerSecond()
	 * @generated
	 * @ordered
	 */
	protected static final double DIFFUSION_SQUARE_METRES_PER_SECOND_EDEFAULT = 1.0E-9;

	/**
	 * The cached value of the '{@link #getDiffusionSquareMetresPerSecond() <em>Diffusion Square Metres Per Second</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDiffusionSquareMetresPerSecond()
	 * @generated
	 * @ordered
	 */
	protected double diffusionSquareMetresPerSecond = DIFFUSION_SQUARE_METRES_PER_SECOND_EDEFAULT;

	/**
	 * The default value of the '{@link #getHalfLifeDays() <em>Half Life Days</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getHalfLifeDays()
	 * @generated
	 * @ordered
	 */
	protected static final double HALF_LIFE_DAYS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getHalfLifeDays() <em>Half Life Days</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getHalfLifeDays()
	 * @generated
	 * @ordered
	 */
	protected double halfLifeDays = HALF_LIFE_DAYS_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ContaminantImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.CONTAMINANT;
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getCasNumber() {
		return casNumber;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCasNumber(String newCasNumber) {
		String oldCasNumber = casNumber;
		casNumber = newCasNumber;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__CAS_NUMBER, oldCasNumber, casNumber));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getKocLitresPerKg() {
		return kocLitresPerKg;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKocLitresPerKg(double newKocLitresPerKg) {
		double oldKocLitresPerKg = kocLitresPerKg;
		kocLitresPerKg = newKocLitresPerKg;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__KOC_LITRES_PER_KG, oldKocLitresPerKg, kocLitresPerKg));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isKdEntered() {
		return kdEntered;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKdEntered(boolean newKdEntered) {
		boolean oldKdEntered = kdEntered;
		kdEntered = newKdEntered;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__KD_ENTERED, oldKdEntered, kdEntered));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getKdLitresPerKg() {
		return kdLitresPerKg;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKdLitresPerKg(double newKdLitresPerKg) {
		double oldKdLitresPerKg = kdLitresPerKg;
		kdLitresPerKg = newKdLitresPerKg;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__KD_LITRES_PER_KG, oldKdLitresPerKg, kdLitresPerKg));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDiffusionSquareMetresPerSecond() {
		return diffusionSquareMetresPerSecond;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDiffusionSquareMetresPerSecond(double newDiffusionSquareMetresPerSecond) {
		double oldDiffusionSquareMetresPerSecond = diffusionSquareMetresPerSecond;
		diffusionSquareMetresPerSecond = newDiffusionSquareMetresPerSecond;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND, oldDiffusionSquareMetresPerSecond, diffusionSquareMetresPerSecond));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getHalfLifeDays() {
		return halfLifeDays;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setHalfLifeDays(double newHalfLifeDays) {
		double oldHalfLifeDays = halfLifeDays;
		halfLifeDays = newHalfLifeDays;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.CONTAMINANT__HALF_LIFE_DAYS, oldHalfLifeDays, halfLifeDays));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.CONTAMINANT__NAME:
				return getName();
			case SitePackage.CONTAMINANT__CAS_NUMBER:
				return getCasNumber();
			case SitePackage.CONTAMINANT__KOC_LITRES_PER_KG:
				return getKocLitresPerKg();
			case SitePackage.CONTAMINANT__KD_ENTERED:
				return isKdEntered();
			case SitePackage.CONTAMINANT__KD_LITRES_PER_KG:
				return getKdLitresPerKg();
			case SitePackage.CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND:
				return getDiffusionSquareMetresPerSecond();
			case SitePackage.CONTAMINANT__HALF_LIFE_DAYS:
				return getHalfLifeDays();
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
			case SitePackage.CONTAMINANT__NAME:
				setName((String)newValue);
				return;
			case SitePackage.CONTAMINANT__CAS_NUMBER:
				setCasNumber((String)newValue);
				return;
			case SitePackage.CONTAMINANT__KOC_LITRES_PER_KG:
				setKocLitresPerKg((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__KD_ENTERED:
				setKdEntered((Boolean)newValue);
				return;
			case SitePackage.CONTAMINANT__KD_LITRES_PER_KG:
				setKdLitresPerKg((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND:
				setDiffusionSquareMetresPerSecond((Double)newValue);
				return;
			case SitePackage.CONTAMINANT__HALF_LIFE_DAYS:
				setHalfLifeDays((Double)newValue);
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
			case SitePackage.CONTAMINANT__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__CAS_NUMBER:
				setCasNumber(CAS_NUMBER_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__KOC_LITRES_PER_KG:
				setKocLitresPerKg(KOC_LITRES_PER_KG_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__KD_ENTERED:
				setKdEntered(KD_ENTERED_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__KD_LITRES_PER_KG:
				setKdLitresPerKg(KD_LITRES_PER_KG_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND:
				setDiffusionSquareMetresPerSecond(DIFFUSION_SQUARE_METRES_PER_SECOND_EDEFAULT);
				return;
			case SitePackage.CONTAMINANT__HALF_LIFE_DAYS:
				setHalfLifeDays(HALF_LIFE_DAYS_EDEFAULT);
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
			case SitePackage.CONTAMINANT__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.CONTAMINANT__CAS_NUMBER:
				return CAS_NUMBER_EDEFAULT == null ? casNumber != null : !CAS_NUMBER_EDEFAULT.equals(casNumber);
			case SitePackage.CONTAMINANT__KOC_LITRES_PER_KG:
				return kocLitresPerKg != KOC_LITRES_PER_KG_EDEFAULT;
			case SitePackage.CONTAMINANT__KD_ENTERED:
				return kdEntered != KD_ENTERED_EDEFAULT;
			case SitePackage.CONTAMINANT__KD_LITRES_PER_KG:
				return kdLitresPerKg != KD_LITRES_PER_KG_EDEFAULT;
			case SitePackage.CONTAMINANT__DIFFUSION_SQUARE_METRES_PER_SECOND:
				return diffusionSquareMetresPerSecond != DIFFUSION_SQUARE_METRES_PER_SECOND_EDEFAULT;
			case SitePackage.CONTAMINANT__HALF_LIFE_DAYS:
				return halfLifeDays != HALF_LIFE_DAYS_EDEFAULT;
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
		result.append(", casNumber: ");
		result.append(casNumber);
		result.append(", kocLitresPerKg: ");
		result.append(kocLitresPerKg);
		result.append(", kdEntered: ");
		result.append(kdEntered);
		result.append(", kdLitresPerKg: ");
		result.append(kdLitresPerKg);
		result.append(", diffusionSquareMetresPerSecond: ");
		result.append(diffusionSquareMetresPerSecond);
		result.append(", halfLifeDays: ");
		result.append(halfLifeDays);
		result.append(')');
		return result.toString();
	}

} //ContaminantImpl
