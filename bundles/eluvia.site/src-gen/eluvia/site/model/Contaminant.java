/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Contaminant</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A contaminant of concern and the properties that govern its flushing. Linear sorption: Kd = Koc foc (Karickhoff, Brown, Scott 1979) unless a measured Kd is entered (kdEntered).
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.Contaminant#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getCasNumber <em>Cas Number</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getKocLitresPerKg <em>Koc Litres Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#isKdEntered <em>Kd Entered</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getKdLitresPerKg <em>Kd Litres Per Kg</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getDiffusionSquareMetresPerSecond <em>Diffusion Square Metres Per Second</em>}</li>
 *   <li>{@link eluvia.site.model.Contaminant#getHalfLifeDays <em>Half Life Days</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getContaminant()
 * @model
 * @generated
 */
public interface Contaminant extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The contaminant's name, e.g. 'Benzene'.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getContaminant_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Cas Number</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Chemical Abstracts Service registry number, e.g. '71-43-2'; may be empty.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Cas Number</em>' attribute.
	 * @see #setCasNumber(String)
	 * @see eluvia.site.model.SitePackage#getContaminant_CasNumber()
	 * @model
	 * @generated
	 */
	String getCasNumber();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getCasNumber <em>Cas Number</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Cas Number</em>' attribute.
	 * @see #getCasNumber()
	 * @generated
	 */
	void setCasNumber(String value);

	/**
	 * Returns the value of the '<em><b>Koc Litres Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Organic-carbon partition coefficient Koc in L/kg; used when kdEntered is false.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Koc Litres Per Kg</em>' attribute.
	 * @see #setKocLitresPerKg(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_KocLitresPerKg()
	 * @model
	 * @generated
	 */
	double getKocLitresPerKg();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getKocLitresPerKg <em>Koc Litres Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Koc Litres Per Kg</em>' attribute.
	 * @see #getKocLitresPerKg()
	 * @generated
	 */
	void setKocLitresPerKg(double value);

	/**
	 * Returns the value of the '<em><b>Kd Entered</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * True when kdLitresPerKg is a measured or chosen Kd that overrides Koc foc in every layer.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Kd Entered</em>' attribute.
	 * @see #setKdEntered(boolean)
	 * @see eluvia.site.model.SitePackage#getContaminant_KdEntered()
	 * @model
	 * @generated
	 */
	boolean isKdEntered();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#isKdEntered <em>Kd Entered</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Kd Entered</em>' attribute.
	 * @see #isKdEntered()
	 * @generated
	 */
	void setKdEntered(boolean value);

	/**
	 * Returns the value of the '<em><b>Kd Litres Per Kg</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Soil-water distribution coefficient Kd in L/kg; used only when kdEntered is true.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Kd Litres Per Kg</em>' attribute.
	 * @see #setKdLitresPerKg(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_KdLitresPerKg()
	 * @model
	 * @generated
	 */
	double getKdLitresPerKg();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getKdLitresPerKg <em>Kd Litres Per Kg</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Kd Litres Per Kg</em>' attribute.
	 * @see #getKdLitresPerKg()
	 * @generated
	 */
	void setKdLitresPerKg(double value);

	/**
	 * Returns the value of the '<em><b>Diffusion Square Metres Per Second</b></em>' attribute.
	 * The default value is <code>"1.0E-9"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Free-water molecular diffusion coefficient D0 in m2/s; about 1e-9 m2/s for small solutes (common practice).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Diffusion Square Metres Per Second</em>' attribute.
	 * @see #setDiffusionSquareMetresPerSecond(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_DiffusionSquareMetresPerSecond()
	 * @model default="1.0E-9"
	 * @generated
	 */
	double getDiffusionSquareMetresPerSecond();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getDiffusionSquareMetresPerSecond <em>Diffusion Square Metres Per Second</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Diffusion Square Metres Per Second</em>' attribute.
	 * @see #getDiffusionSquareMetresPerSecond()
	 * @generated
	 */
	void setDiffusionSquareMetresPerSecond(double value);

	/**
	 * Returns the value of the '<em><b>Half Life Days</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * First-order decay half-life in days; 0 means no decay.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Half Life Days</em>' attribute.
	 * @see #setHalfLifeDays(double)
	 * @see eluvia.site.model.SitePackage#getContaminant_HalfLifeDays()
	 * @model
	 * @generated
	 */
	double getHalfLifeDays();

	/**
	 * Sets the value of the '{@link eluvia.site.model.Contaminant#getHalfLifeDays <em>Half Life Days</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Half Life Days</em>' attribute.
	 * @see #getHalfLifeDays()
	 * @generated
	 */
	void setHalfLifeDays(double value);

} // Contaminant
