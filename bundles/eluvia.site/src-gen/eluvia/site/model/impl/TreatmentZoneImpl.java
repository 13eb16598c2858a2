/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.SitePackage;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;

import eluvia.site.model.Vertex;
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
 * An implementation of the model object '<em><b>Treatment Zone</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.TreatmentZoneImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.TreatmentZoneImpl#getAreaSquareMetres <em>Area Square Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.TreatmentZoneImpl#getTopDepthMetres <em>Top Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.TreatmentZoneImpl#getBottomDepthMetres <em>Bottom Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.TreatmentZoneImpl#getSourceConcentrations <em>Source Concentrations</em>}</li>
 *   <li>{@link eluvia.site.model.impl.TreatmentZoneImpl#getFootprint <em>Footprint</em>}</li>
 *   <li>{@link eluvia.site.model.impl.TreatmentZoneImpl#getEffectiveAreaSquareMetres <em>Effective Area Square Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.TreatmentZoneImpl#getVolumeCubicMetres <em>Volume Cubic Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.TreatmentZoneImpl#getPoreVolumeCubicMetres <em>Pore Volume Cubic Metres</em>}</li>
 * </ul>
 *
 * @generated
 */
public class TreatmentZoneImpl extends MinimalEObjectImpl.Container implements TreatmentZone {
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
	 * The default value of the '{@link #getAreaSquareMetres() <em>Area Square Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAreaSquareMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double AREA_SQUARE_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getAreaSquareMetres() <em>Area Square Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAreaSquareMetres()
	 * @generated
	 * @ordered
	 */
	protected double areaSquareMetres = AREA_SQUARE_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getTopDepthMetres() <em>Top Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTopDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double TOP_DEPTH_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTopDepthMetres() <em>Top Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTopDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected double topDepthMetres = TOP_DEPTH_METRES_EDEFAULT;

	/**
	 * The default value of the '{@link #getBottomDepthMetres() <em>Bottom Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBottomDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double BOTTOM_DEPTH_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getBottomDepthMetres() <em>Bottom Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBottomDepthMetres()
	 * @generated
	 * @ordered
	 */
	protected double bottomDepthMetres = BOTTOM_DEPTH_METRES_EDEFAULT;

	/**
	 * The cached value of the '{@link #getSourceConcentrations() <em>Source Concentrations</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSourceConcentrations()
	 * @generated
	 * @ordered
	 */
	protected EList<SourceConcentration> sourceConcentrations;

	/**
	 * The cached value of the '{@link #getFootprint() <em>Footprint</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFootprint()
	 * @generated
	 * @ordered
	 */
	protected EList<Vertex> footprint;

	/**
	 * The default value of the '{@link #getEffectiveAreaSquareMetres() <em>Effective Area Square Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEffectiveAreaSquareMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double EFFECTIVE_AREA_SQUARE_METRES_EDEFAULT = 0.0;

	/**
	 * The default value of the '{@link #getVolumeCubicMetres() <em>Volume Cubic Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVolumeCubicMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double VOLUME_CUBIC_METRES_EDEFAULT = 0.0;

	/**
	 * The default value of the '{@link #getPoreVolumeCubicMetres() <em>Pore Volume Cubic Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPoreVolumeCubicMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double PORE_VOLUME_CUBIC_METRES_EDEFAULT = 0.0;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected TreatmentZoneImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.TREATMENT_ZONE;
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.TREATMENT_ZONE__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getAreaSquareMetres() {
		return areaSquareMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAreaSquareMetres(double newAreaSquareMetres) {
		double oldAreaSquareMetres = areaSquareMetres;
		areaSquareMetres = newAreaSquareMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.TREATMENT_ZONE__AREA_SQUARE_METRES, oldAreaSquareMetres, areaSquareMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTopDepthMetres() {
		return topDepthMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTopDepthMetres(double newTopDepthMetres) {
		double oldTopDepthMetres = topDepthMetres;
		topDepthMetres = newTopDepthMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.TREATMENT_ZONE__TOP_DEPTH_METRES, oldTopDepthMetres, topDepthMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getBottomDepthMetres() {
		return bottomDepthMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBottomDepthMetres(double newBottomDepthMetres) {
		double oldBottomDepthMetres = bottomDepthMetres;
		bottomDepthMetres = newBottomDepthMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.TREATMENT_ZONE__BOTTOM_DEPTH_METRES, oldBottomDepthMetres, bottomDepthMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<SourceConcentration> getSourceConcentrations() {
		if (sourceConcentrations == null) {
			sourceConcentrations = new EObjectContainmentEList<SourceConcentration>(SourceConcentration.class, this, SitePackage.TREATMENT_ZONE__SOURCE_CONCENTRATIONS);
		}
		return sourceConcentrations;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Vertex> getFootprint() {
		if (footprint == null) {
			footprint = new EObjectContainmentEList<Vertex>(Vertex.class, this, SitePackage.TREATMENT_ZONE__FOOTPRINT);
		}
		return footprint;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getEffectiveAreaSquareMetres() {
		return eluvia.site.derived.ZoneGeometry.effectiveAreaSquareMetres(this);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getVolumeCubicMetres() {
		return eluvia.site.derived.ZoneGeometry.volumeCubicMetres(this);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPoreVolumeCubicMetres() {
		return eluvia.site.derived.ZoneGeometry.poreVolumeCubicMetres(this);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case SitePackage.TREATMENT_ZONE__SOURCE_CONCENTRATIONS:
				return ((InternalEList<?>)getSourceConcentrations()).basicRemove(otherEnd, msgs);
			case SitePackage.TREATMENT_ZONE__FOOTPRINT:
				return ((InternalEList<?>)getFootprint()).basicRemove(otherEnd, msgs);
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
			case SitePackage.TREATMENT_ZONE__NAME:
				return getName();
			case SitePackage.TREATMENT_ZONE__AREA_SQUARE_METRES:
				return getAreaSquareMetres();
			case SitePackage.TREATMENT_ZONE__TOP_DEPTH_METRES:
				return getTopDepthMetres();
			case SitePackage.TREATMENT_ZONE__BOTTOM_DEPTH_METRES:
				return getBottomDepthMetres();
			case SitePackage.TREATMENT_ZONE__SOURCE_CONCENTRATIONS:
				return getSourceConcentrations();
			case SitePackage.TREATMENT_ZONE__FOOTPRINT:
				return getFootprint();
			case SitePackage.TREATMENT_ZONE__EFFECTIVE_AREA_SQUARE_METRES:
				return getEffectiveAreaSquareMetres();
			case SitePackage.TREATMENT_ZONE__VOLUME_CUBIC_METRES:
				return getVolumeCubicMetres();
			case SitePackage.TREATMENT_ZONE__PORE_VOLUME_CUBIC_METRES:
				return getPoreVolumeCubicMetres();
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
			case SitePackage.TREATMENT_ZONE__NAME:
				setName((String)newValue);
				return;
			case SitePackage.TREATMENT_ZONE__AREA_SQUARE_METRES:
				setAreaSquareMetres((Double)newValue);
				return;
			case SitePackage.TREATMENT_ZONE__TOP_DEPTH_METRES:
				setTopDepthMetres((Double)newValue);
				return;
			case SitePackage.TREATMENT_ZONE__BOTTOM_DEPTH_METRES:
				setBottomDepthMetres((Double)newValue);
				return;
			case SitePackage.TREATMENT_ZONE__SOURCE_CONCENTRATIONS:
				getSourceConcentrations().clear();
				getSourceConcentrations().addAll((Collection<? extends SourceConcentration>)newValue);
				return;
			case SitePackage.TREATMENT_ZONE__FOOTPRINT:
				getFootprint().clear();
				getFootprint().addAll((Collection<? extends Vertex>)newValue);
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
			case SitePackage.TREATMENT_ZONE__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.TREATMENT_ZONE__AREA_SQUARE_METRES:
				setAreaSquareMetres(AREA_SQUARE_METRES_EDEFAULT);
				return;
			case SitePackage.TREATMENT_ZONE__TOP_DEPTH_METRES:
				setTopDepthMetres(TOP_DEPTH_METRES_EDEFAULT);
				return;
			case SitePackage.TREATMENT_ZONE__BOTTOM_DEPTH_METRES:
				setBottomDepthMetres(BOTTOM_DEPTH_METRES_EDEFAULT);
				return;
			case SitePackage.TREATMENT_ZONE__SOURCE_CONCENTRATIONS:
				getSourceConcentrations().clear();
				return;
			case SitePackage.TREATMENT_ZONE__FOOTPRINT:
				getFootprint().clear();
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
			case SitePackage.TREATMENT_ZONE__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.TREATMENT_ZONE__AREA_SQUARE_METRES:
				return areaSquareMetres != AREA_SQUARE_METRES_EDEFAULT;
			case SitePackage.TREATMENT_ZONE__TOP_DEPTH_METRES:
				return topDepthMetres != TOP_DEPTH_METRES_EDEFAULT;
			case SitePackage.TREATMENT_ZONE__BOTTOM_DEPTH_METRES:
				return bottomDepthMetres != BOTTOM_DEPTH_METRES_EDEFAULT;
			case SitePackage.TREATMENT_ZONE__SOURCE_CONCENTRATIONS:
				return sourceConcentrations != null && !sourceConcentrations.isEmpty();
			case SitePackage.TREATMENT_ZONE__FOOTPRINT:
				return footprint != null && !footprint.isEmpty();
			case SitePackage.TREATMENT_ZONE__EFFECTIVE_AREA_SQUARE_METRES:
				return getEffectiveAreaSquareMetres() != EFFECTIVE_AREA_SQUARE_METRES_EDEFAULT;
			case SitePackage.TREATMENT_ZONE__VOLUME_CUBIC_METRES:
				return getVolumeCubicMetres() != VOLUME_CUBIC_METRES_EDEFAULT;
			case SitePackage.TREATMENT_ZONE__PORE_VOLUME_CUBIC_METRES:
				return getPoreVolumeCubicMetres() != PORE_VOLUME_CUBIC_METRES_EDEFAULT;
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
		result.append(", areaSquareMetres: ");
		result.append(areaSquareMetres);
		result.append(", topDepthMetres: ");
		result.append(topDepthMetres);
		result.append(", bottomDepthMetres: ");
		result.append(bottomDepthMetres);
		result.append(')');
		return result.toString();
	}

} //TreatmentZoneImpl
