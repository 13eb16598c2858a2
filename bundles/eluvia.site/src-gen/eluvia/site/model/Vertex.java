/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Vertex</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A point of a polygon in the site's local frame.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.Vertex#getEastingMetres <em>Easting Metres</em>}</li>
 *   <li>{@link eluvia.site.model.Vertex#getNorthingMetres <em>Northing Metres</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getVertex()
 * @model
 * @generated
 */
public interface Vertex extends EObject {
	/**
	 * Returns the value of the '<em><b>Easting Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Local easting in metres.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Easting Metres</em>' attribute.
	 * @see #setEastingMetres(double)
	 * @see eluvia.site.model.SitePackage#getVertex_EastingMetres()
	 * @model
	 * @generated
	 */
	double getEastingMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Vertex#getEastingMetres <em>Easting Metres</em>}' attribute.
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
	 * @see eluvia.site.model.SitePackage#getVertex_NorthingMetres()
	 * @model
	 * @generated
	 */
	double getNorthingMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Vertex#getNorthingMetres <em>Northing Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Northing Metres</em>' attribute.
	 * @see #getNorthingMetres()
	 * @generated
	 */
	void setNorthingMetres(double value);

} // Vertex
