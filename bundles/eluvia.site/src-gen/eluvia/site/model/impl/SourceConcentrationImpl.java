/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.Contaminant;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SourceConcentration;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Source Concentration</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.SourceConcentrationImpl#getContaminant <em>Contaminant</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SourceConcentrationImpl#getSoilConcentrationMilligramsPerKg <em>Soil Concentration Milligrams Per Kg</em>}</li>
 * </ul>
 *
 * @generated
 */
public class SourceConcentrationImpl extends MinimalEObjectImpl.Container implements SourceConcentration {
	/**
	 * The cached value of the '{@link #getContaminant() <em>Contaminant</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContaminant()
	 * @generated
	 * @ordered
	 */
	protected Contaminant contaminant;

	/**
	 * The default value of the '{@link #getSoilConcentrationMilligramsPerKg() <em>Soil Concentration Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSoilConcentrationMilligramsPerKg()
	 * @generated
	 * @ordered
	 */
	protected static final double SOIL_CONCENTRATION_MILLIGRAMS_PER_KG_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSoilConcentrationMilligramsPerKg() <em>Soil Concentration Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSoilConcentrationMilligramsPerKg()
	 * @generated
	 * @ordered
	 */
	protected double soilConcentrationMilligramsPerKg = SOIL_CONCENTRATION_MILLIGRAMS_PER_KG_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected SourceConcentrationImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.SOURCE_CONCENTRATION;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Contaminant getContaminant() {
		if (contaminant != null && contaminant.eIsProxy()) {
			InternalEObject oldContaminant = (InternalEObject)contaminant;
			contaminant = (Contaminant)eResolveProxy(oldContaminant);
			if (contaminant != oldContaminant) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, SitePackage.SOURCE_CONCENTRATION__CONTAMINANT, oldContaminant, contaminant));
			}
		}
		return contaminant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Contaminant basicGetContaminant() {
		return contaminant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setContaminant(Contaminant newContaminant) {
		Contaminant oldContaminant = contaminant;
		contaminant = newContaminant;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOURCE_CONCENTRATION__CONTAMINANT, oldContaminant, contaminant));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSoilConcentrationMilligramsPerKg() {
		return soilConcentrationMilligramsPerKg;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSoilConcentrationMilligramsPerKg(double newSoilConcentrationMilligramsPerKg) {
		double oldSoilConcentrationMilligramsPerKg = soilConcentrationMilligramsPerKg;
		soilConcentrationMilligramsPerKg = newSoilConcentrationMilligramsPerKg;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SOURCE_CONCENTRATION__SOIL_CONCENTRATION_MILLIGRAMS_PER_KG, oldSoilConcentrationMilligramsPerKg, soilConcentrationMilligramsPerKg));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.SOURCE_CONCENTRATION__CONTAMINANT:
				if (resolve) return getContaminant();
				return basicGetContaminant();
			case SitePackage.SOURCE_CONCENTRATION__SOIL_CONCENTRATION_MILLIGRAMS_PER_KG:
				return getSoilConcentrationMilligramsPerKg();
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
			case SitePackage.SOURCE_CONCENTRATION__CONTAMINANT:
				setContaminant((Contaminant)newValue);
				return;
			case SitePackage.SOURCE_CONCENTRATION__SOIL_CONCENTRATION_MILLIGRAMS_PER_KG:
				setSoilConcentrationMilligramsPerKg((Double)newValue);
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
			case SitePackage.SOURCE_CONCENTRATION__CONTAMINANT:
				setContaminant((Contaminant)null);
				return;
			case SitePackage.SOURCE_CONCENTRATION__SOIL_CONCENTRATION_MILLIGRAMS_PER_KG:
				setSoilConcentrationMilligramsPerKg(SOIL_CONCENTRATION_MILLIGRAMS_PER_KG_EDEFAULT);
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
			case SitePackage.SOURCE_CONCENTRATION__CONTAMINANT:
				return contaminant != null;
			case SitePackage.SOURCE_CONCENTRATION__SOIL_CONCENTRATION_MILLIGRAMS_PER_KG:
				return soilConcentrationMilligramsPerKg != SOIL_CONCENTRATION_MILLIGRAMS_PER_KG_EDEFAULT;
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
		result.append(" (soilConcentrationMilligramsPerKg: ");
		result.append(soilConcentrationMilligramsPerKg);
		result.append(')');
		return result.toString();
	}

} //SourceConcentrationImpl
