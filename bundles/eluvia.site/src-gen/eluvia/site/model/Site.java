/**
 */
package eluvia.site.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Site</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The site: its soil profile (layers, ordered from the ground surface down) and its treatment zones.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.Site#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.Site#getDescription <em>Description</em>}</li>
 *   <li>{@link eluvia.site.model.Site#getLayers <em>Layers</em>}</li>
 *   <li>{@link eluvia.site.model.Site#getZones <em>Zones</em>}</li>
 *   <li>{@link eluvia.site.model.Site#getCoordinateFrame <em>Coordinate Frame</em>}</li>
 *   <li>{@link eluvia.site.model.Site#getGroundSurfaceElevationMetres <em>Ground Surface Elevation Metres</em>}</li>
 *   <li>{@link eluvia.site.model.Site#getBoundary <em>Boundary</em>}</li>
 *   <li>{@link eluvia.site.model.Site#getSamplingLocations <em>Sampling Locations</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getSite()
 * @model
 * @generated
 */
public interface Site extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The site's name.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getSite_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Site#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Free text: location, history, setting.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Description</em>' attribute.
	 * @see #setDescription(String)
	 * @see eluvia.site.model.SitePackage#getSite_Description()
	 * @model
	 * @generated
	 */
	String getDescription();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Site#getDescription <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Description</em>' attribute.
	 * @see #getDescription()
	 * @generated
	 */
	void setDescription(String value);

	/**
	 * Returns the value of the '<em><b>Layers</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.SoilLayer}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The soil layers, ordered from top to bottom; contiguous (each layer's top depth is the bottom depth of the one above).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Layers</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getSite_Layers()
	 * @model containment="true"
	 * @generated
	 */
	EList<SoilLayer> getLayers();

	/**
	 * Returns the value of the '<em><b>Zones</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.TreatmentZone}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The treatment zones: volumes of soil above a cleanup level.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Zones</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getSite_Zones()
	 * @model containment="true"
	 * @generated
	 */
	EList<TreatmentZone> getZones();

	/**
	 * Returns the value of the '<em><b>Coordinate Frame</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Description of the local coordinate frame in which eastings and northings are given (origin, orientation, datum), in the user's words. Eastings and northings are in metres.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Coordinate Frame</em>' attribute.
	 * @see #setCoordinateFrame(String)
	 * @see eluvia.site.model.SitePackage#getSite_CoordinateFrame()
	 * @model
	 * @generated
	 */
	String getCoordinateFrame();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Site#getCoordinateFrame <em>Coordinate Frame</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Coordinate Frame</em>' attribute.
	 * @see #getCoordinateFrame()
	 * @generated
	 */
	void setCoordinateFrame(String value);

	/**
	 * Returns the value of the '<em><b>Ground Surface Elevation Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Elevation of the ground surface in metres above the datum named in coordinateFrame; depths are measured down from it.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Ground Surface Elevation Metres</em>' attribute.
	 * @see #setGroundSurfaceElevationMetres(double)
	 * @see eluvia.site.model.SitePackage#getSite_GroundSurfaceElevationMetres()
	 * @model
	 * @generated
	 */
	double getGroundSurfaceElevationMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Site#getGroundSurfaceElevationMetres <em>Ground Surface Elevation Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Ground Surface Elevation Metres</em>' attribute.
	 * @see #getGroundSurfaceElevationMetres()
	 * @generated
	 */
	void setGroundSurfaceElevationMetres(double value);

	/**
	 * Returns the value of the '<em><b>Boundary</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.Vertex}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Site boundary polygon in the local frame (at least 3 vertices, or none when not drawn).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Boundary</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getSite_Boundary()
	 * @model containment="true"
	 * @generated
	 */
	EList<Vertex> getBoundary();

	/**
	 * Returns the value of the '<em><b>Sampling Locations</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.SamplingLocation}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Sampling locations (borings, test pits) with their soil samples.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Sampling Locations</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getSite_SamplingLocations()
	 * @model containment="true"
	 * @generated
	 */
	EList<SamplingLocation> getSamplingLocations();

} // Site
