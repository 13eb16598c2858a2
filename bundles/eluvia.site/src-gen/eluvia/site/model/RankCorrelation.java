/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Rank Correlation</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A target Spearman rank correlation between two uncertain inputs, imposed on the sample by the Iman and Conover (1982) method.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.RankCorrelation#getFirst <em>First</em>}</li>
 *   <li>{@link eluvia.site.model.RankCorrelation#getSecond <em>Second</em>}</li>
 *   <li>{@link eluvia.site.model.RankCorrelation#getCoefficient <em>Coefficient</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getRankCorrelation()
 * @model
 * @generated
 */
public interface RankCorrelation extends EObject {
	/**
	 * Returns the value of the '<em><b>First</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * One input of the pair.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>First</em>' reference.
	 * @see #setFirst(UncertainInput)
	 * @see eluvia.site.model.SitePackage#getRankCorrelation_First()
	 * @model
	 * @generated
	 */
	UncertainInput getFirst();

	/**
	 * Sets the value of the '{@link eluvia.site.model.RankCorrelation#getFirst <em>First</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>First</em>' reference.
	 * @see #getFirst()
	 * @generated
	 */
	void setFirst(UncertainInput value);

	/**
	 * Returns the value of the '<em><b>Second</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The other input of the pair.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Second</em>' reference.
	 * @see #setSecond(UncertainInput)
	 * @see eluvia.site.model.SitePackage#getRankCorrelation_Second()
	 * @model
	 * @generated
	 */
	UncertainInput getSecond();

	/**
	 * Sets the value of the '{@link eluvia.site.model.RankCorrelation#getSecond <em>Second</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Second</em>' reference.
	 * @see #getSecond()
	 * @generated
	 */
	void setSecond(UncertainInput value);

	/**
	 * Returns the value of the '<em><b>Coefficient</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The rank correlation, dimensionless, greater than -1 and less than 1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Coefficient</em>' attribute.
	 * @see #setCoefficient(double)
	 * @see eluvia.site.model.SitePackage#getRankCorrelation_Coefficient()
	 * @model
	 * @generated
	 */
	double getCoefficient();

	/**
	 * Sets the value of the '{@link eluvia.site.model.RankCorrelation#getCoefficient <em>Coefficient</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Coefficient</em>' attribute.
	 * @see #getCoefficient()
	 * @generated
	 */
	void setCoefficient(double value);

} // RankCorrelation
