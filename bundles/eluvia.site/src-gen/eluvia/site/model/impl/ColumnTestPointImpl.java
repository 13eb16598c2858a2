/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.ColumnTestPoint;
import eluvia.site.model.SitePackage;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Column Test Point</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.ColumnTestPointImpl#getPoreVolumes <em>Pore Volumes</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ColumnTestPointImpl#getRelativeConcentration <em>Relative Concentration</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ColumnTestPointImpl extends MinimalEObjectImpl.Container implements ColumnTestPoint {
	/**
	 * The default value of the '{@link #getPoreVolumes() <em>Pore Volumes</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPoreVolumes()
	 * @generated
	 * @ordered
	 */
	protected static final double PORE_VOLUMES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPoreVolumes() <em>Pore Volumes</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPoreVolumes()
	 * @generated
	 * @ordered
	 */
	protected double poreVolumes = PORE_VOLUMES_EDEFAULT;

	/**
	 * The default value of the '{@link #getRelativeConcentration() <em>Relative Concentration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRelativeConcentration()
	 * @generated
	 * @ordered
	 */
	protected static final double RELATIVE_CONCENTRATION_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getRelativeConcentration() <em>Relative Concentration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRelativeConcentration()
	 * @generated
	 * @ordered
	 */
	protected double relativeConcentration = RELATIVE_CONCENTRATION_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ColumnTestPointImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.COLUMN_TEST_POINT;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPoreVolumes() {
		return poreVolumes;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPoreVolumes(double newPoreVolumes) {
		double oldPoreVolumes = poreVolumes;
		poreVolumes = newPoreVolumes;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.COLUMN_TEST_POINT__PORE_VOLUMES, oldPoreVolumes, poreVolumes));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getRelativeConcentration() {
		return relativeConcentration;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRelativeConcentration(double newRelativeConcentration) {
		double oldRelativeConcentration = relativeConcentration;
		relativeConcentration = newRelativeConcentration;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.COLUMN_TEST_POINT__RELATIVE_CONCENTRATION, oldRelativeConcentration, relativeConcentration));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.COLUMN_TEST_POINT__PORE_VOLUMES:
				return getPoreVolumes();
			case SitePackage.COLUMN_TEST_POINT__RELATIVE_CONCENTRATION:
				return getRelativeConcentration();
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
			case SitePackage.COLUMN_TEST_POINT__PORE_VOLUMES:
				setPoreVolumes((Double)newValue);
				return;
			case SitePackage.COLUMN_TEST_POINT__RELATIVE_CONCENTRATION:
				setRelativeConcentration((Double)newValue);
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
			case SitePackage.COLUMN_TEST_POINT__PORE_VOLUMES:
				setPoreVolumes(PORE_VOLUMES_EDEFAULT);
				return;
			case SitePackage.COLUMN_TEST_POINT__RELATIVE_CONCENTRATION:
				setRelativeConcentration(RELATIVE_CONCENTRATION_EDEFAULT);
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
			case SitePackage.COLUMN_TEST_POINT__PORE_VOLUMES:
				return poreVolumes != PORE_VOLUMES_EDEFAULT;
			case SitePackage.COLUMN_TEST_POINT__RELATIVE_CONCENTRATION:
				return relativeConcentration != RELATIVE_CONCENTRATION_EDEFAULT;
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
		result.append(" (poreVolumes: ");
		result.append(poreVolumes);
		result.append(", relativeConcentration: ");
		result.append(relativeConcentration);
		result.append(')');
		return result.toString();
	}

} //ColumnTestPointImpl
