/**
 */
package eluvia.site.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Uncertainty Settings</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * How the Monte Carlo uncertainty analysis runs (eluvia.design UncertaintyAnalysis): whether the project asks for it, the number of runs, the seed and the sampling method, with the uncertain inputs and the rank correlations between them.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.UncertaintySettings#isEnabled <em>Enabled</em>}</li>
 *   <li>{@link eluvia.site.model.UncertaintySettings#getRunCount <em>Run Count</em>}</li>
 *   <li>{@link eluvia.site.model.UncertaintySettings#getSeed <em>Seed</em>}</li>
 *   <li>{@link eluvia.site.model.UncertaintySettings#getSamplingMethod <em>Sampling Method</em>}</li>
 *   <li>{@link eluvia.site.model.UncertaintySettings#getInputs <em>Inputs</em>}</li>
 *   <li>{@link eluvia.site.model.UncertaintySettings#getRankCorrelations <em>Rank Correlations</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getUncertaintySettings()
 * @model
 * @generated
 */
public interface UncertaintySettings extends EObject {
	/**
	 * Returns the value of the '<em><b>Enabled</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Whether the design run includes the uncertainty analysis (P10 / P50 / P90 of every headline figure).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Enabled</em>' attribute.
	 * @see #setEnabled(boolean)
	 * @see eluvia.site.model.SitePackage#getUncertaintySettings_Enabled()
	 * @model
	 * @generated
	 */
	boolean isEnabled();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertaintySettings#isEnabled <em>Enabled</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Enabled</em>' attribute.
	 * @see #isEnabled()
	 * @generated
	 */
	void setEnabled(boolean value);

	/**
	 * Returns the value of the '<em><b>Run Count</b></em>' attribute.
	 * The default value is <code>"2000"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Number of Monte Carlo runs (a count, no unit), 2 to 10,000,000; 1,000 to 10,000 is usual.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Run Count</em>' attribute.
	 * @see #setRunCount(int)
	 * @see eluvia.site.model.SitePackage#getUncertaintySettings_RunCount()
	 * @model default="2000"
	 * @generated
	 */
	int getRunCount();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertaintySettings#getRunCount <em>Run Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Run Count</em>' attribute.
	 * @see #getRunCount()
	 * @generated
	 */
	void setRunCount(int value);

	/**
	 * Returns the value of the '<em><b>Seed</b></em>' attribute.
	 * The default value is <code>"20261201"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Seed of the random generator (an integer, no unit): the same seed gives the same results.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Seed</em>' attribute.
	 * @see #setSeed(long)
	 * @see eluvia.site.model.SitePackage#getUncertaintySettings_Seed()
	 * @model default="20261201"
	 * @generated
	 */
	long getSeed();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertaintySettings#getSeed <em>Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Seed</em>' attribute.
	 * @see #getSeed()
	 * @generated
	 */
	void setSeed(long value);

	/**
	 * Returns the value of the '<em><b>Sampling Method</b></em>' attribute.
	 * The literals are from the enumeration {@link eluvia.site.model.UncertaintySampling}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Latin hypercube (stratified) or plain Monte Carlo sampling.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Sampling Method</em>' attribute.
	 * @see eluvia.site.model.UncertaintySampling
	 * @see #setSamplingMethod(UncertaintySampling)
	 * @see eluvia.site.model.SitePackage#getUncertaintySettings_SamplingMethod()
	 * @model
	 * @generated
	 */
	UncertaintySampling getSamplingMethod();

	/**
	 * Sets the value of the '{@link eluvia.site.model.UncertaintySettings#getSamplingMethod <em>Sampling Method</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Sampling Method</em>' attribute.
	 * @see eluvia.site.model.UncertaintySampling
	 * @see #getSamplingMethod()
	 * @generated
	 */
	void setSamplingMethod(UncertaintySampling value);

	/**
	 * Returns the value of the '<em><b>Inputs</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.UncertainInput}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The uncertain inputs: which model value varies and by which distribution.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Inputs</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getUncertaintySettings_Inputs()
	 * @model containment="true"
	 * @generated
	 */
	EList<UncertainInput> getInputs();

	/**
	 * Returns the value of the '<em><b>Rank Correlations</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.RankCorrelation}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Target Spearman rank correlations between pairs of uncertain inputs (Iman and Conover 1982); pairs not listed are independent.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Rank Correlations</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getUncertaintySettings_RankCorrelations()
	 * @model containment="true"
	 * @generated
	 */
	EList<RankCorrelation> getRankCorrelations();

} // UncertaintySettings
