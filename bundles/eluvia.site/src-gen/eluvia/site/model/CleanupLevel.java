/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Cleanup Level</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The concentration a contaminant must be brought below, and the basis on which the level was set.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.CleanupLevel#getContaminant <em>Contaminant</em>}</li>
 *   <li>{@link eluvia.site.model.CleanupLevel#getSoilLevelMilligramsPerKg <em>Soil Level Milligrams Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.CleanupLevel#getBasis <em>Basis</em>}</li>
 *   <li>{@link eluvia.site.model.CleanupLevel#isSoilLevelEntered <em>Soil Level Entered</em>}</li>
 *   <li>{@link eluvia.site.model.CleanupLevel#isPorewaterLevelEntered <em>Porewater Level Entered</em>}</li>
 *   <li>{@link eluvia.site.model.CleanupLevel#getPorewaterLevelMilligramsPerLitre <em>Porewater Level Milligrams Per Litre</em>}</li>
 *   <li>{@link eluvia.site.model.CleanupLevel#getStatistic <em>Statistic</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getCleanupLevel()
 * @model
 * @generated
 */
public interface CleanupLevel extends EObject {
	/**
	 * Returns the value of the '<em><b>Contaminant</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The contaminant the level applies to.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Contaminant</em>' reference.
	 * @see #setContaminant(Contaminant)
	 * @see eluvia.site.model.SitePackage#getCleanupLevel_Contaminant()
	 * @model required="true"
	 * @generated
	 */
	Contaminant getContaminant();

	/**
	 * Sets the value of the '{@link eluvia.site.model.CleanupLevel#getContaminant <em>Contaminant</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Contaminant</em>' reference.
	 * @see #getContaminant()
	 * @generated
	 */
	void setContaminant(Contaminant value);

	/**
	 * Returns the value of the '<em><b>Soil Level Milligrams Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Cleanup level in soil, in mg/kg of dry soil.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Soil Level Milligrams Per Kg</em>' attribute.
	 * @see #setSoilLevelMilligramsPerKg(double)
	 * @see eluvia.site.model.SitePackage#getCleanupLevel_SoilLevelMilligramsPerKg()
	 * @model
	 * @generated
	 */
	double getSoilLevelMilligramsPerKg();

	/**
	 * Sets the value of the '{@link eluvia.site.model.CleanupLevel#getSoilLevelMilligramsPerKg <em>Soil Level Milligrams Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Soil Level Milligrams Per Kg</em>' attribute.
	 * @see #getSoilLevelMilligramsPerKg()
	 * @generated
	 */
	void setSoilLevelMilligramsPerKg(double value);

	/**
	 * Returns the value of the '<em><b>Basis</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Where the level comes from, in the user's own words (rule, permit, risk assessment).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Basis</em>' attribute.
	 * @see #setBasis(String)
	 * @see eluvia.site.model.SitePackage#getCleanupLevel_Basis()
	 * @model
	 * @generated
	 */
	String getBasis();

	/**
	 * Sets the value of the '{@link eluvia.site.model.CleanupLevel#getBasis <em>Basis</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Basis</em>' attribute.
	 * @see #getBasis()
	 * @generated
	 */
	void setBasis(String value);

	/**
	 * Returns the value of the '<em><b>Soil Level Entered</b></em>' attribute.
	 * The default value is <code>"true"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * True when the soil cleanup level (soilLevelMilligramsPerKg) applies.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Soil Level Entered</em>' attribute.
	 * @see #setSoilLevelEntered(boolean)
	 * @see eluvia.site.model.SitePackage#getCleanupLevel_SoilLevelEntered()
	 * @model default="true"
	 * @generated
	 */
	boolean isSoilLevelEntered();

	/**
	 * Sets the value of the '{@link eluvia.site.model.CleanupLevel#isSoilLevelEntered <em>Soil Level Entered</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Soil Level Entered</em>' attribute.
	 * @see #isSoilLevelEntered()
	 * @generated
	 */
	void setSoilLevelEntered(boolean value);

	/**
	 * Returns the value of the '<em><b>Porewater Level Entered</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * True when the pore-water cleanup level (porewaterLevelMilligramsPerLitre) applies.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Porewater Level Entered</em>' attribute.
	 * @see #setPorewaterLevelEntered(boolean)
	 * @see eluvia.site.model.SitePackage#getCleanupLevel_PorewaterLevelEntered()
	 * @model
	 * @generated
	 */
	boolean isPorewaterLevelEntered();

	/**
	 * Sets the value of the '{@link eluvia.site.model.CleanupLevel#isPorewaterLevelEntered <em>Porewater Level Entered</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Porewater Level Entered</em>' attribute.
	 * @see #isPorewaterLevelEntered()
	 * @generated
	 */
	void setPorewaterLevelEntered(boolean value);

	/**
	 * Returns the value of the '<em><b>Porewater Level Milligrams Per Litre</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Cleanup level in pore water (or leachate), in mg/L.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Porewater Level Milligrams Per Litre</em>' attribute.
	 * @see #setPorewaterLevelMilligramsPerLitre(double)
	 * @see eluvia.site.model.SitePackage#getCleanupLevel_PorewaterLevelMilligramsPerLitre()
	 * @model
	 * @generated
	 */
	double getPorewaterLevelMilligramsPerLitre();

	/**
	 * Sets the value of the '{@link eluvia.site.model.CleanupLevel#getPorewaterLevelMilligramsPerLitre <em>Porewater Level Milligrams Per Litre</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Porewater Level Milligrams Per Litre</em>' attribute.
	 * @see #getPorewaterLevelMilligramsPerLitre()
	 * @generated
	 */
	void setPorewaterLevelMilligramsPerLitre(double value);

	/**
	 * Returns the value of the '<em><b>Statistic</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.ComplianceStatistic}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The statistic of the sample results that must meet the level.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Statistic</em>' attribute.
	 * @see eluvia.site.model.ComplianceStatistic
	 * @see #setStatistic(ComplianceStatistic)
	 * @see eluvia.site.model.SitePackage#getCleanupLevel_Statistic()
	 * @model
	 * @generated
	 */
	ComplianceStatistic getStatistic();

	/**
	 * Sets the value of the '{@link eluvia.site.model.CleanupLevel#getStatistic <em>Statistic</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Statistic</em>' attribute.
	 * @see eluvia.site.model.ComplianceStatistic
	 * @see #getStatistic()
	 * @generated
	 */
	void setStatistic(ComplianceStatistic value);

} // CleanupLevel
