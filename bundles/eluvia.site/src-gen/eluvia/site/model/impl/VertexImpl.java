/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.SitePackage;
import eluvia.site.model.Vertex;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Vertex</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.VertexImpl#getEastingMetres <em>Easting Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.VertexImpl#getNorthingMetres <em>Northing Metres</em>}</li>
 * </ul>
 *
 * @generated
 */
public class VertexImpl extends MinimalEObjectImpl.Container implements Vertex {
	/**
	 * The default value of the '{@link #getEastingMetres() <em>Easting Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEastingMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double EASTING_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getEastingMetres() <em>Easting Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEastingMetres()
	 * @generated
	 * @ordered
	 */
	protected double eastingMetres = EASTING_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getNorthingMetres() <em>Northing Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNorthingMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double NORTHING_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getNorthingMetres() <em>Northing Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNorthingMetres()
	 * @generated
	 * @ordered
	 */
	protected double northingMetres = NORTHING_METRES_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected VertexImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.VERTEX;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getEastingMetres() {
		return eastingMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEastingMetres(double newEastingMetres) {
		double oldEastingMetres = eastingMetres;
		eastingMetres = newEastingMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.VERTEX__EASTING_METRES, oldEastingMetres, eastingMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getNorthingMetres() {
		return northingMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNorthingMetres(double newNorthingMetres) {
		double oldNorthingMetres = northingMetres;
		northingMetres = newNorthingMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.VERTEX__NORTHING_METRES, oldNorthingMetres, northingMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.VERTEX__EASTING_METRES:
				return getEastingMetres();
			case SitePackage.VERTEX__NORTHING_METRES:
				return getNorthingMetres();
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
			case SitePackage.VERTEX__EASTING_METRES:
				setEastingMetres((Double)newValue);
				return;
			case SitePackage.VERTEX__NORTHING_METRES:
				setNorthingMetres((Double)newValue);
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
			case SitePackage.VERTEX__EASTING_METRES:
				setEastingMetres(EASTING_METRES_EDEFAULT);
				return;
			case SitePackage.VERTEX__NORTHING_METRES:
				setNorthingMetres(NORTHING_METRES_EDEFAULT);
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
			case SitePackage.VERTEX__EASTING_METRES:
				return eastingMetres != EASTING_METRES_EDEFAULT;
			case SitePackage.VERTEX__NORTHING_METRES:
				return northingMetres != NORTHING_METRES_EDEFAULT;
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
		result.append(" (eastingMetres: ");
		result.append(eastingMetres);
		result.append(", northingMetres: ");
		result.append(northingMetres);
		result.append(')');
		return result.toString();
	}

} //VertexImpl
