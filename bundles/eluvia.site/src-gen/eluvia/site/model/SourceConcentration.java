/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Source Concentration</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The representative initial concentration of one contaminant in a treatment zone.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.SourceConcentration#getContaminant <em>Contaminant</em>}</li>
 *   <li>{@link eluvia.site.model.SourceConcentration#getSoilConcentrationMilligramsPerKg <em>Soil Concentration Milligrams Per Kg</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getSourceConcentration()
 * @model
 * @generated
 */
public interface SourceConcentration extends EObject {
	/**
	 * Returns the value of the '<em><b>Contaminant</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The contaminant.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Contaminant</em>' reference.
	 * @see #setContaminant(Contaminant)
	 * @see eluvia.site.model.SitePackage#getSourceConcentration_Contaminant()
	 * @model required="true"
	 * @generated
	 */
	Contaminant getContaminant();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SourceConcentration#getContaminant <em>Contaminant</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Contaminant</em>' reference.
	 * @see #getContaminant()
	 * @generated
	 */
	void setContaminant(Contaminant value);

	/**
	 * Returns the value of the '<em><b>Soil Concentration Milligrams Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Representative initial total soil concentration in mg/kg of dry soil.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Soil Concentration Milligrams Per Kg</em>' attribute.
	 * @see #setSoilConcentrationMilligramsPerKg(double)
	 * @see eluvia.site.model.SitePackage#getSourceConcentration_SoilConcentrationMilligramsPerKg()
	 * @model
	 * @generated
	 */
	double getSoilConcentrationMilligramsPerKg();

	/**
	 * Sets the value of the '{@link eluvia.site.model.SourceConcentration#getSoilConcentrationMilligramsPerKg <em>Soil Concentration Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Soil Concentration Milligrams Per Kg</em>' attribute.
	 * @see #getSoilConcentrationMilligramsPerKg()
	 * @generated
	 */
	void setSoilConcentrationMilligramsPerKg(double value);

} // SourceConcentration
