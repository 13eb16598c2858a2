/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.Sample;
import eluvia.site.model.SamplingLocation;
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
 * An implementation of the model object '<em><b>Sampling Location</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.SamplingLocationImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SamplingLocationImpl#getEastingMetres <em>Easting Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SamplingLocationImpl#getNorthingMetres <em>Northing Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SamplingLocationImpl#getGroundElevationMetres <em>Ground Elevation Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SamplingLocationImpl#getSamples <em>Samples</em>}</li>
 * </ul>
 *
 * @generated
 */
public class SamplingLocationImpl extends MinimalEObjectImpl.Container implements SamplingLocation {
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
	 * The default value of the '{@link #getGroundElevationMetres() <em>Ground Elevation Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGroundElevationMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double GROUND_ELEVATION_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getGroundElevationMetres() <em>Ground Elevation Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGroundElevationMetres()
	 * @generated
	 * @ordered
	 */
	protected double groundElevationMetres = GROUND_ELEVATION_METRES_EDEFAULT;

	/**
	 * The cached value of the '{@link #getSamples() <em>Samples</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSamples()
	 * @generated
	 * @ordered
	 */
	protected EList<Sample> samples;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected SamplingLocationImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.SAMPLING_LOCATION;
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SAMPLING_LOCATION__NAME, oldName, name));
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SAMPLING_LOCATION__EASTING_METRES, oldEastingMetres, eastingMetres));
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SAMPLING_LOCATION__NORTHING_METRES, oldNorthingMetres, northingMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getGroundElevationMetres() {
		return groundElevationMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setGroundElevationMetres(double newGroundElevationMetres) {
		double oldGroundElevationMetres = groundElevationMetres;
		groundElevationMetres = newGroundElevationMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SAMPLING_LOCATION__GROUND_ELEVATION_METRES, oldGroundElevationMetres, groundElevationMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Sample> getSamples() {
		if (samples == null) {
			samples = new EObjectContainmentEList<Sample>(Sample.class, this, SitePackage.SAMPLING_LOCATION__SAMPLES);
		}
		return samples;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case SitePackage.SAMPLING_LOCATION__SAMPLES:
				return ((InternalEList<?>)getSamples()).basicRemove(otherEnd, msgs);
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
			case SitePackage.SAMPLING_LOCATION__NAME:
				return getName();
			case SitePackage.SAMPLING_LOCATION__EASTING_METRES:
				return getEastingMetres();
			case SitePackage.SAMPLING_LOCATION__NORTHING_METRES:
				return getNorthingMetres();
			case SitePackage.SAMPLING_LOCATION__GROUND_ELEVATION_METRES:
				return getGroundElevationMetres();
			case SitePackage.SAMPLING_LOCATION__SAMPLES:
				return getSamples();
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
			case SitePackage.SAMPLING_LOCATION__NAME:
				setName((String)newValue);
				return;
			case SitePackage.SAMPLING_LOCATION__EASTING_METRES:
				setEastingMetres((Double)newValue);
				return;
			case SitePackage.SAMPLING_LOCATION__NORTHING_METRES:
				setNorthingMetres((Double)newValue);
				return;
			case SitePackage.SAMPLING_LOCATION__GROUND_ELEVATION_METRES:
				setGroundElevationMetres((Double)newValue);
				return;
			case SitePackage.SAMPLING_LOCATION__SAMPLES:
				getSamples().clear();
				getSamples().addAll((Collection<? extends Sample>)newValue);
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
			case SitePackage.SAMPLING_LOCATION__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.SAMPLING_LOCATION__EASTING_METRES:
				setEastingMetres(EASTING_METRES_EDEFAULT);
				return;
			case SitePackage.SAMPLING_LOCATION__NORTHING_METRES:
				setNorthingMetres(NORTHING_METRES_EDEFAULT);
				return;
			case SitePackage.SAMPLING_LOCATION__GROUND_ELEVATION_METRES:
				setGroundElevationMetres(GROUND_ELEVATION_METRES_EDEFAULT);
				return;
			case SitePackage.SAMPLING_LOCATION__SAMPLES:
				getSamples().clear();
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
			case SitePackage.SAMPLING_LOCATION__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.SAMPLING_LOCATION__EASTING_METRES:
				return eastingMetres != EASTING_METRES_EDEFAULT;
			case SitePackage.SAMPLING_LOCATION__NORTHING_METRES:
				return northingMetres != NORTHING_METRES_EDEFAULT;
			case SitePackage.SAMPLING_LOCATION__GROUND_ELEVATION_METRES:
				return groundElevationMetres != GROUND_ELEVATION_METRES_EDEFAULT;
			case SitePackage.SAMPLING_LOCATION__SAMPLES:
				return samples != null && !samples.isEmpty();
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
		result.append(", eastingMetres: ");
		result.append(eastingMetres);
		result.append(", northingMetres: ");
		result.append(northingMetres);
		result.append(", groundElevationMetres: ");
		result.append(groundElevationMetres);
		result.append(')');
		return result.toString();
	}

} //SamplingLocationImpl
