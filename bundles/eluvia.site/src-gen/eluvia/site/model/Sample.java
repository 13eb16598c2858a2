/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Sample</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A soil sample: a depth interval and the concentration of one contaminant measured in it.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.Sample#getTopDepthMetres <em>Top Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.Sample#getBottomDepthMetres <em>Bottom Depth Metres</em>}</li>
 *   <li>{@link eluvia.site.model.Sample#getContaminant <em>Contaminant</em>}</li>
 *   <li>{@link eluvia.site.model.Sample#getConcentrationMilligramsPerKg <em>Concentration Milligrams Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.Sample#isNonDetect <em>Non Detect</em>}</li>
 *   <li>{@link eluvia.site.model.Sample#getDetectionLimitMilligramsPerKg <em>Detection Limit Milligrams Per Kg</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getSample()
 * @model
 * @generated
 */
public interface Sample extends EObject {
	/**
	 * Returns the value of the '<em><b>Top Depth Metres</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Depth of the sample interval's top below ground at the location, in metres.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Top Depth Metres</em>' attribute.
	 * @see #setTopDepthMetres(double)
	 * @see eluvia.site.model.SitePackage#getSample_TopDepthMetres()
	 * @model
	 * @generated
	 */
	double getTopDepthMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Sample#getTopDepthMetres <em>Top Depth Metres</em>}' attribute.
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
	 * Depth of the sample interval's bottom below ground at the location, in metres; at least the top depth.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Bottom Depth Metres</em>' attribute.
	 * @see #setBottomDepthMetres(double)
	 * @see eluvia.site.model.SitePackage#getSample_BottomDepthMetres()
	 * @model
	 * @generated
	 */
	double getBottomDepthMetres();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Sample#getBottomDepthMetres <em>Bottom Depth Metres</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Bottom Depth Metres</em>' attribute.
	 * @see #getBottomDepthMetres()
	 * @generated
	 */
	void setBottomDepthMetres(double value);

	/**
	 * Returns the value of the '<em><b>Contaminant</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The contaminant analysed.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Contaminant</em>' reference.
	 * @see #setContaminant(Contaminant)
	 * @see eluvia.site.model.SitePackage#getSample_Contaminant()
	 * @model required="true"
	 * @generated
	 */
	Contaminant getContaminant();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Sample#getContaminant <em>Contaminant</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Contaminant</em>' reference.
	 * @see #getContaminant()
	 * @generated
	 */
	void setContaminant(Contaminant value);

	/**
	 * Returns the value of the '<em><b>Concentration Milligrams Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Measured concentration in mg/kg of dry soil; for a non-detect, the reported value (often the detection limit).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Concentration Milligrams Per Kg</em>' attribute.
	 * @see #setConcentrationMilligramsPerKg(double)
	 * @see eluvia.site.model.SitePackage#getSample_ConcentrationMilligramsPerKg()
	 * @model
	 * @generated
	 */
	double getConcentrationMilligramsPerKg();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Sample#getConcentrationMilligramsPerKg <em>Concentration Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Concentration Milligrams Per Kg</em>' attribute.
	 * @see #getConcentrationMilligramsPerKg()
	 * @generated
	 */
	void setConcentrationMilligramsPerKg(double value);

	/**
	 * Returns the value of the '<em><b>Non Detect</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * True when the contaminant was not detected above the detection limit.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Non Detect</em>' attribute.
	 * @see #setNonDetect(boolean)
	 * @see eluvia.site.model.SitePackage#getSample_NonDetect()
	 * @model
	 * @generated
	 */
	boolean isNonDetect();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Sample#isNonDetect <em>Non Detect</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Non Detect</em>' attribute.
	 * @see #isNonDetect()
	 * @generated
	 */
	void setNonDetect(boolean value);

	/**
	 * Returns the value of the '<em><b>Detection Limit Milligrams Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Detection (reporting) limit in mg/kg; required for a non-detect.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Detection Limit Milligrams Per Kg</em>' attribute.
	 * @see #setDetectionLimitMilligramsPerKg(double)
	 * @see eluvia.site.model.SitePackage#getSample_DetectionLimitMilligramsPerKg()
	 * @model
	 * @generated
	 */
	double getDetectionLimitMilligramsPerKg();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Sample#getDetectionLimitMilligramsPerKg <em>Detection Limit Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Detection Limit Milligrams Per Kg</em>' attribute.
	 * @see #getDetectionLimitMilligramsPerKg()
	 * @generated
	 */
	void setDetectionLimitMilligramsPerKg(double value);

} // Sample
