/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.SamplingLocation;
import eluvia.site.model.Site;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;
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
 * An implementation of the model object '<em><b>Site</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.SiteImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SiteImpl#getDescription <em>Description</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SiteImpl#getLayers <em>Layers</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SiteImpl#getZones <em>Zones</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SiteImpl#getCoordinateFrame <em>Coordinate Frame</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SiteImpl#getGroundSurfaceElevationMetres <em>Ground Surface Elevation Metres</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SiteImpl#getBoundary <em>Boundary</em>}</li>
 *   <li>{@link eluvia.site.model.impl.SiteImpl#getSamplingLocations <em>Sampling Locations</em>}</li>
 * </ul>
 *
 * @generated
 */
public class SiteImpl extends MinimalEObjectImpl.Container implements Site {
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
	 * The default value of the '{@link #getDescription() <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDescription()
	 * @generated
	 * @ordered
	 */
	protected static final String DESCRIPTION_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getDescription() <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDescription()
	 * @generated
	 * @ordered
	 */
	protected String description = DESCRIPTION_EDEFAULT;

	/**
	 * The cached value of the '{@link #getLayers() <em>Layers</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLayers()
	 * @generated
	 * @ordered
	 */
	protected EList<SoilLayer> layers;

	/**
	 * The cached value of the '{@link #getZones() <em>Zones</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getZones()
	 * @generated
	 * @ordered
	 */
	protected EList<TreatmentZone> zones;

	/**
	 * The default value of the '{@link #getCoordinateFrame() <em>Coordinate Frame</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCoordinateFrame()
	 * @generated
	 * @ordered
	 */
	protected static final String COORDINATE_FRAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getCoordinateFrame() <em>Coordinate Frame</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCoordinateFrame()
	 * @generated
	 * @ordered
	 */
	protected String coordinateFrame = COORDINATE_FRAME_EDEFAULT;

	/**
	 * The default value of the '{@link #getGroundSurfaceElevationMetres() <em>Ground Surface Elevation Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGroundSurfaceElevationMetres()
	 * @generated
	 * @ordered
	 */
	protected static final double GROUND_SURFACE_ELEVATION_METRES_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getGroundSurfaceElevationMetres() <em>Ground Surface Elevation Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGroundSurfaceElevationMetres()
	 * @generated
	 * @ordered
	 */
	protected double groundSurfaceElevationMetres = GROUND_SURFACE_ELEVATION_METRES_EDEFAULT;

	/**
	 * The cached value of the '{@link #getBoundary() <em>Boundary</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBoundary()
	 * @generated
	 * @ordered
	 */
	protected EList<Vertex> boundary;

	/**
	 * The cached value of the '{@link #getSamplingLocations() <em>Sampling Locations</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSamplingLocations()
	 * @generated
	 * @ordered
	 */
	protected EList<SamplingLocation> samplingLocations;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected SiteImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.SITE;
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
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SITE__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getDescription() {
		return description;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDescription(String newDescription) {
		String oldDescription = description;
		description = newDescription;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SITE__DESCRIPTION, oldDescription, description));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<SoilLayer> getLayers() {
		if (layers == null) {
			layers = new EObjectContainmentEList<SoilLayer>(SoilLayer.class, this, SitePackage.SITE__LAYERS);
		}
		return layers;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<TreatmentZone> getZones() {
		if (zones == null) {
			zones = new EObjectContainmentEList<TreatmentZone>(TreatmentZone.class, this, SitePackage.SITE__ZONES);
		}
		return zones;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getCoordinateFrame() {
		return coordinateFrame;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCoordinateFrame(String newCoordinateFrame) {
		String oldCoordinateFrame = coordinateFrame;
		coordinateFrame = newCoordinateFrame;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SITE__COORDINATE_FRAME, oldCoordinateFrame, coordinateFrame));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getGroundSurfaceElevationMetres() {
		return groundSurfaceElevationMetres;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setGroundSurfaceElevationMetres(double newGroundSurfaceElevationMetres) {
		double oldGroundSurfaceElevationMetres = groundSurfaceElevationMetres;
		groundSurfaceElevationMetres = newGroundSurfaceElevationMetres;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.SITE__GROUND_SURFACE_ELEVATION_METRES, oldGroundSurfaceElevationMetres, groundSurfaceElevationMetres));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Vertex> getBoundary() {
		if (boundary == null) {
			boundary = new EObjectContainmentEList<Vertex>(Vertex.class, this, SitePackage.SITE__BOUNDARY);
		}
		return boundary;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<SamplingLocation> getSamplingLocations() {
		if (samplingLocations == null) {
			samplingLocations = new EObjectContainmentEList<SamplingLocation>(SamplingLocation.class, this, SitePackage.SITE__SAMPLING_LOCATIONS);
		}
		return samplingLocations;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case SitePackage.SITE__LAYERS:
				return ((InternalEList<?>)getLayers()).basicRemove(otherEnd, msgs);
			case SitePackage.SITE__ZONES:
				return ((InternalEList<?>)getZones()).basicRemove(otherEnd, msgs);
			case SitePackage.SITE__BOUNDARY:
				return ((InternalEList<?>)getBoundary()).basicRemove(otherEnd, msgs);
			case SitePackage.SITE__SAMPLING_LOCATIONS:
				return ((InternalEList<?>)getSamplingLocations()).basicRemove(otherEnd, msgs);
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
			case SitePackage.SITE__NAME:
				return getName();
			case SitePackage.SITE__DESCRIPTION:
				return getDescription();
			case SitePackage.SITE__LAYERS:
				return getLayers();
			case SitePackage.SITE__ZONES:
				return getZones();
			case SitePackage.SITE__COORDINATE_FRAME:
				return getCoordinateFrame();
			case SitePackage.SITE__GROUND_SURFACE_ELEVATION_METRES:
				return getGroundSurfaceElevationMetres();
			case SitePackage.SITE__BOUNDARY:
				return getBoundary();
			case SitePackage.SITE__SAMPLING_LOCATIONS:
				return getSamplingLocations();
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
			case SitePackage.SITE__NAME:
				setName((String)newValue);
				return;
			case SitePackage.SITE__DESCRIPTION:
				setDescription((String)newValue);
				return;
			case SitePackage.SITE__LAYERS:
				getLayers().clear();
				getLayers().addAll((Collection<? extends SoilLayer>)newValue);
				return;
			case SitePackage.SITE__ZONES:
				getZones().clear();
				getZones().addAll((Collection<? extends TreatmentZone>)newValue);
				return;
			case SitePackage.SITE__COORDINATE_FRAME:
				setCoordinateFrame((String)newValue);
				return;
			case SitePackage.SITE__GROUND_SURFACE_ELEVATION_METRES:
				setGroundSurfaceElevationMetres((Double)newValue);
				return;
			case SitePackage.SITE__BOUNDARY:
				getBoundary().clear();
				getBoundary().addAll((Collection<? extends Vertex>)newValue);
				return;
			case SitePackage.SITE__SAMPLING_LOCATIONS:
				getSamplingLocations().clear();
				getSamplingLocations().addAll((Collection<? extends SamplingLocation>)newValue);
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
			case SitePackage.SITE__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.SITE__DESCRIPTION:
				setDescription(DESCRIPTION_EDEFAULT);
				return;
			case SitePackage.SITE__LAYERS:
				getLayers().clear();
				return;
			case SitePackage.SITE__ZONES:
				getZones().clear();
				return;
			case SitePackage.SITE__COORDINATE_FRAME:
				setCoordinateFrame(COORDINATE_FRAME_EDEFAULT);
				return;
			case SitePackage.SITE__GROUND_SURFACE_ELEVATION_METRES:
				setGroundSurfaceElevationMetres(GROUND_SURFACE_ELEVATION_METRES_EDEFAULT);
				return;
			case SitePackage.SITE__BOUNDARY:
				getBoundary().clear();
				return;
			case SitePackage.SITE__SAMPLING_LOCATIONS:
				getSamplingLocations().clear();
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
			case SitePackage.SITE__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.SITE__DESCRIPTION:
				return DESCRIPTION_EDEFAULT == null ? description != null : !DESCRIPTION_EDEFAULT.equals(description);
			case SitePackage.SITE__LAYERS:
				return layers != null && !layers.isEmpty();
			case SitePackage.SITE__ZONES:
				return zones != null && !zones.isEmpty();
			case SitePackage.SITE__COORDINATE_FRAME:
				return COORDINATE_FRAME_EDEFAULT == null ? coordinateFrame != null : !COORDINATE_FRAME_EDEFAULT.equals(coordinateFrame);
			case SitePackage.SITE__GROUND_SURFACE_ELEVATION_METRES:
				return groundSurfaceElevationMetres != GROUND_SURFACE_ELEVATION_METRES_EDEFAULT;
			case SitePackage.SITE__BOUNDARY:
				return boundary != null && !boundary.isEmpty();
			case SitePackage.SITE__SAMPLING_LOCATIONS:
				return samplingLocations != null && !samplingLocations.isEmpty();
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
		result.append(", description: ");
		result.append(description);
		result.append(", coordinateFrame: ");
		result.append(coordinateFrame);
		result.append(", groundSurfaceElevationMetres: ");
		result.append(groundSurfaceElevationMetres);
		result.append(')');
		return result.toString();
	}

} //SiteImpl
