/**
 */
package eluvia.site.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Sampling Location</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A place where soil was sampled (boring, test pit) and its samples.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.SamplingLocation#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.SamplingLocation#getEastingMetres <em>Easting Metres</em>}</li>
 *   <li>{@link eluvia.site.model.SamplingLocation#getNorthingMetres <em>Northing Metres</em>}</li>
 *   <li>{@link eluvia.site.model.SamplingLocation#getGroundElevationMetres <em>Ground Elevation Metres</em>}</li>
 *   <li>{@link eluvia.site.model.SamplingLocation#getSamples <em>Samples</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getSamplingLocation()
 * @model
 * @generated
 */
public interface SamplingLocation extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The location's name, e.g. 'B-12'.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getSamplingLocation_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SamplingLocation#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Easting Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Local easting in metres.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Easting Metres</em>' attribute.
	 * @see #setEastingMetres(double)
	 * @see eluvia.site.model.SitePackage#getSamplingLocation_EastingMetres()
	 * @model
	 * @generated
	 */
	double getEastingMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SamplingLocation#getEastingMetres <em>Easting Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Easting Metres</em>' attribute.
	 * @see #getEastingMetres()
	 * @generated
	 */
	void setEastingMetres(double value);

	/**
	 * Returns the value of the '<em><b>Northing Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Local northing in metres.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Northing Metres</em>' attribute.
	 * @see #setNorthingMetres(double)
	 * @see eluvia.site.model.SitePackage#getSamplingLocation_NorthingMetres()
	 * @model
	 * @generated
	 */
	double getNorthingMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SamplingLocation#getNorthingMetres <em>Northing Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Northing Metres</em>' attribute.
	 * @see #getNorthingMetres()
	 * @generated
	 */
	void setNorthingMetres(double value);

	/**
	 * Returns the value of the '<em><b>Ground Elevation Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Ground elevation at the location in metres above the site datum.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Ground Elevation Metres</em>' attribute.
	 * @see #setGroundElevationMetres(double)
	 * @see eluvia.site.model.SitePackage#getSamplingLocation_GroundElevationMetres()
	 * @model
	 * @generated
	 */
	double getGroundElevationMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SamplingLocation#getGroundElevationMetres <em>Ground Elevation Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Ground Elevation Metres</em>' attribute.
	 * @see #getGroundElevationMetres()
	 * @generated
	 */
	void setGroundElevationMetres(double value);

	/**
	 * Returns the value of the '<em><b>Samples</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.Sample}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The soil samples taken at this location.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Samples</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getSamplingLocation_Samples()
	 * @model containment="true"
	 * @generated
	 */
	EList<Sample> getSamples();

} // SamplingLocation
