/**
 */
package eluvia.site.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Treatment Zone</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A volume of soil to be treated: a plan area between two depths, with the representative initial concentration of each contaminant.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.TreatmentZone#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.TreatmentZone#getAreaSquareMetres <em>Area Square Metres</em>}</li>
 *   <li>{@link eluvia.site.model.TreatmentZone#getTopDepthMetres <em>Top Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.TreatmentZone#getBottomDepthMetres <em>Bottom Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.TreatmentZone#getSourceConcentrations <em>Source Concentrations</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getTreatmentZone()
 * @model
 * @generated
 */
public interface TreatmentZone extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The zone's name.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getTreatmentZone_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.TreatmentZone#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Area Square Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Plan area of the zone in m2.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Area Square Metres</em>' attribute.
	 * @see #setAreaSquareMetres(double)
	 * @see eluvia.site.model.SitePackage#getTreatmentZone_AreaSquareMetres()
	 * @model
	 * @generated
	 */
	double getAreaSquareMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.TreatmentZone#getAreaSquareMetres <em>Area Square Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Area Square Metres</em>' attribute.
	 * @see #getAreaSquareMetres()
	 * @generated
	 */
	void setAreaSquareMetres(double value);

	/**
	 * Returns the value of the '<em><b>Top Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Depth of the zone's top below the ground surface, in metres.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Top Depth Metres</em>' attribute.
	 * @see #setTopDepthMetres(double)
	 * @see eluvia.site.model.SitePackage#getTreatmentZone_TopDepthMetres()
	 * @model
	 * @generated
	 */
	double getTopDepthMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.TreatmentZone#getTopDepthMetres <em>Top Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Top Depth Metres</em>' attribute.
	 * @see #getTopDepthMetres()
	 * @generated
	 */
	void setTopDepthMetres(double value);

	/**
	 * Returns the value of the '<em><b>Bottom Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Depth of the zone's bottom below the ground surface, in metres; greater than the top depth.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Bottom Depth Metres</em>' attribute.
	 * @see #setBottomDepthMetres(double)
	 * @see eluvia.site.model.SitePackage#getTreatmentZone_BottomDepthMetres()
	 * @model
	 * @generated
	 */
	double getBottomDepthMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.TreatmentZone#getBottomDepthMetres <em>Bottom Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Bottom Depth Metres</em>' attribute.
	 * @see #getBottomDepthMetres()
	 * @generated
	 */
	void setBottomDepthMetres(double value);

	/**
	 * Returns the value of the '<em><b>Source Concentrations</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.SourceConcentration}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Representative initial soil concentration of each contaminant in the zone.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Source Concentrations</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getTreatmentZone_SourceConcentrations()
	 * @model containment="true"
	 * @generated
	 */
	EList<SourceConcentration> getSourceConcentrations();

} // TreatmentZone
