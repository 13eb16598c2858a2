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
 *   <li>{@link eluvia.site.model.TreatmentZone#getFootprint <em>Footprint</em>}</li>
 *   <li>{@link eluvia.site.model.TreatmentZone#getEffectiveAreaSquareMetres <em>Effective Area Square Metres</em>}</li>
 *   <li>{@link eluvia.site.model.TreatmentZone#getVolumeCubicMetres <em>Volume Cubic Metres</em>}</li>
 *   <li>{@link eluvia.site.model.TreatmentZone#getPoreVolumeCubicMetres <em>Pore Volume Cubic Metres</em>}</li>
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

	/**
	 * Returns the value of the '<em><b>Footprint</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.Vertex}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Footprint polygon of the zone in the local frame (at least 3 vertices, or none: then areaSquareMetres is used).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Footprint</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getTreatmentZone_Footprint()
	 * @model containment="true"
	 * @generated
	 */
	EList<Vertex> getFootprint();

	/**
	 * Returns the value of the '<em><b>Effective Area Square Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Plan area in m2 used by calculations: the footprint polygon's area by the shoelace formula when it has 3 or more vertices, otherwise areaSquareMetres.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Effective Area Square Metres</em>' attribute.
	 * @see eluvia.site.model.SitePackage#getTreatmentZone_EffectiveAreaSquareMetres()
	 * @model transient="true" changeable="false" volatile="true" derived="true"
	 * @generated
	 */
	double getEffectiveAreaSquareMetres();

	/**
	 * Returns the value of the '<em><b>Volume Cubic Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Bank volume of the zone in m3: effective area times (bottom depth - top depth).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Volume Cubic Metres</em>' attribute.
	 * @see eluvia.site.model.SitePackage#getTreatmentZone_VolumeCubicMetres()
	 * @model transient="true" changeable="false" volatile="true" derived="true"
	 * @generated
	 */
	double getVolumeCubicMetres();

	/**
	 * Returns the value of the '<em><b>Pore Volume Cubic Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Pore volume of the zone in m3 during flushing: the sum over the soil layers it spans of area x thickness within the zone x water content (the water-filled pore space that one pore volume of flushing displaces).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Pore Volume Cubic Metres</em>' attribute.
	 * @see eluvia.site.model.SitePackage#getTreatmentZone_PoreVolumeCubicMetres()
	 * @model transient="true" changeable="false" volatile="true" derived="true"
	 * @generated
	 */
	double getPoreVolumeCubicMetres();

} // TreatmentZone
