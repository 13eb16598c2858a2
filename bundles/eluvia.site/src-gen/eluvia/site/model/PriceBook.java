/**
 */
package eluvia.site.model;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Price Book</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A set of unit rates with their sources, and the book's own reference.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.PriceBook#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getCurrency <em>Currency</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getReference <em>Reference</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getItems <em>Items</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getScopeContingencyPercent <em>Scope Contingency Percent</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getBidContingencyPercent <em>Bid Contingency Percent</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getProjectManagementPercent <em>Project Management Percent</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getRemedialDesignPercent <em>Remedial Design Percent</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getConstructionManagementPercent <em>Construction Management Percent</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getOperatingContingencyPercent <em>Operating Contingency Percent</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getOperatingProjectManagementPercent <em>Operating Project Management Percent</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getTechnicalSupportPercent <em>Technical Support Percent</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getDiscountRatePercent <em>Discount Rate Percent</em>}</li>
 *   <li>{@link eluvia.site.model.PriceBook#getDiscountRateBasis <em>Discount Rate Basis</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getPriceBook()
 * @model
 * @generated
 */
public interface PriceBook extends EObject {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The price book's name.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getPriceBook_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Currency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Currency of the rates unless an item says otherwise (ISO 4217 code, e.g. USD, EUR).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Currency</em>' attribute.
	 * @see #setCurrency(String)
	 * @see eluvia.site.model.SitePackage#getPriceBook_Currency()
	 * @model
	 * @generated
	 */
	String getCurrency();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getCurrency <em>Currency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Currency</em>' attribute.
	 * @see #getCurrency()
	 * @generated
	 */
	void setCurrency(String value);

	/**
	 * Returns the value of the '<em><b>Reference</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The book's reference: where the rates come from and their price date.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Reference</em>' attribute.
	 * @see #setReference(String)
	 * @see eluvia.site.model.SitePackage#getPriceBook_Reference()
	 * @model
	 * @generated
	 */
	String getReference();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getReference <em>Reference</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Reference</em>' attribute.
	 * @see #getReference()
	 * @generated
	 */
	void setReference(String value);

	/**
	 * Returns the value of the '<em><b>Items</b></em>' containment reference list.
	 * The list contents are of type {@link eluvia.site.model.PriceItem}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The unit rates.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Items</em>' containment reference list.
	 * @see eluvia.site.model.SitePackage#getPriceBook_Items()
	 * @model containment="true"
	 * @generated
	 */
	EList<PriceItem> getItems();

	/**
	 * Returns the value of the '<em><b>Scope Contingency Percent</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Capital scope contingency, % of the capital subtotal (EPA 540-R-00-002 layout); 0 to 100; default 0 (none).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Scope Contingency Percent</em>' attribute.
	 * @see #setScopeContingencyPercent(double)
	 * @see eluvia.site.model.SitePackage#getPriceBook_ScopeContingencyPercent()
	 * @model default="0.0"
	 * @generated
	 */
	double getScopeContingencyPercent();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getScopeContingencyPercent <em>Scope Contingency Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Scope Contingency Percent</em>' attribute.
	 * @see #getScopeContingencyPercent()
	 * @generated
	 */
	void setScopeContingencyPercent(double value);

	/**
	 * Returns the value of the '<em><b>Bid Contingency Percent</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Capital bid contingency, % of the capital subtotal (EPA 540-R-00-002 layout); 0 to 100; default 0 (none).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Bid Contingency Percent</em>' attribute.
	 * @see #setBidContingencyPercent(double)
	 * @see eluvia.site.model.SitePackage#getPriceBook_BidContingencyPercent()
	 * @model default="0.0"
	 * @generated
	 */
	double getBidContingencyPercent();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getBidContingencyPercent <em>Bid Contingency Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Bid Contingency Percent</em>' attribute.
	 * @see #getBidContingencyPercent()
	 * @generated
	 */
	void setBidContingencyPercent(double value);

	/**
	 * Returns the value of the '<em><b>Project Management Percent</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Capital project management, % of the capital subtotal plus contingency (EPA 540-R-00-002 layout); 0 to 100; default 0.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Project Management Percent</em>' attribute.
	 * @see #setProjectManagementPercent(double)
	 * @see eluvia.site.model.SitePackage#getPriceBook_ProjectManagementPercent()
	 * @model default="0.0"
	 * @generated
	 */
	double getProjectManagementPercent();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getProjectManagementPercent <em>Project Management Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Project Management Percent</em>' attribute.
	 * @see #getProjectManagementPercent()
	 * @generated
	 */
	void setProjectManagementPercent(double value);

	/**
	 * Returns the value of the '<em><b>Remedial Design Percent</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Remedial design, % of the capital subtotal plus contingency (EPA 540-R-00-002 layout); 0 to 100; default 0.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Remedial Design Percent</em>' attribute.
	 * @see #setRemedialDesignPercent(double)
	 * @see eluvia.site.model.SitePackage#getPriceBook_RemedialDesignPercent()
	 * @model default="0.0"
	 * @generated
	 */
	double getRemedialDesignPercent();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getRemedialDesignPercent <em>Remedial Design Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Remedial Design Percent</em>' attribute.
	 * @see #getRemedialDesignPercent()
	 * @generated
	 */
	void setRemedialDesignPercent(double value);

	/**
	 * Returns the value of the '<em><b>Construction Management Percent</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Construction management, % of the capital subtotal plus contingency (EPA 540-R-00-002 layout); 0 to 100; default 0.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Construction Management Percent</em>' attribute.
	 * @see #setConstructionManagementPercent(double)
	 * @see eluvia.site.model.SitePackage#getPriceBook_ConstructionManagementPercent()
	 * @model default="0.0"
	 * @generated
	 */
	double getConstructionManagementPercent();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getConstructionManagementPercent <em>Construction Management Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Construction Management Percent</em>' attribute.
	 * @see #getConstructionManagementPercent()
	 * @generated
	 */
	void setConstructionManagementPercent(double value);

	/**
	 * Returns the value of the '<em><b>Operating Contingency Percent</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * O&M contingency, % of the annual O&M subtotal (EPA 540-R-00-002 layout); 0 to 100; default 0.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Operating Contingency Percent</em>' attribute.
	 * @see #setOperatingContingencyPercent(double)
	 * @see eluvia.site.model.SitePackage#getPriceBook_OperatingContingencyPercent()
	 * @model default="0.0"
	 * @generated
	 */
	double getOperatingContingencyPercent();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getOperatingContingencyPercent <em>Operating Contingency Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Operating Contingency Percent</em>' attribute.
	 * @see #getOperatingContingencyPercent()
	 * @generated
	 */
	void setOperatingContingencyPercent(double value);

	/**
	 * Returns the value of the '<em><b>Operating Project Management Percent</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * O&M project management, % of the annual O&M subtotal plus contingency (EPA 540-R-00-002 layout); 0 to 100; default 0.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Operating Project Management Percent</em>' attribute.
	 * @see #setOperatingProjectManagementPercent(double)
	 * @see eluvia.site.model.SitePackage#getPriceBook_OperatingProjectManagementPercent()
	 * @model default="0.0"
	 * @generated
	 */
	double getOperatingProjectManagementPercent();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getOperatingProjectManagementPercent <em>Operating Project Management Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Operating Project Management Percent</em>' attribute.
	 * @see #getOperatingProjectManagementPercent()
	 * @generated
	 */
	void setOperatingProjectManagementPercent(double value);

	/**
	 * Returns the value of the '<em><b>Technical Support Percent</b></em>' attribute.
	 * The default value is <code>"0.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * O&M technical support, % of the annual O&M subtotal plus contingency (EPA 540-R-00-002 layout); 0 to 100; default 0.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Technical Support Percent</em>' attribute.
	 * @see #setTechnicalSupportPercent(double)
	 * @see eluvia.site.model.SitePackage#getPriceBook_TechnicalSupportPercent()
	 * @model default="0.0"
	 * @generated
	 */
	double getTechnicalSupportPercent();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getTechnicalSupportPercent <em>Technical Support Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Technical Support Percent</em>' attribute.
	 * @see #getTechnicalSupportPercent()
	 * @generated
	 */
	void setTechnicalSupportPercent(double value);

	/**
	 * Returns the value of the '<em><b>Discount Rate Percent</b></em>' attribute.
	 * The default value is <code>"7.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Real discount rate for the present value of the O&M costs, % per year; -5 to 30; default 7 (the rate of OMB Circular A-94 (1992) for feasibility studies).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Discount Rate Percent</em>' attribute.
	 * @see #setDiscountRatePercent(double)
	 * @see eluvia.site.model.SitePackage#getPriceBook_DiscountRatePercent()
	 * @model default="7.0"
	 * @generated
	 */
	double getDiscountRatePercent();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getDiscountRatePercent <em>Discount Rate Percent</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Discount Rate Percent</em>' attribute.
	 * @see #getDiscountRatePercent()
	 * @generated
	 */
	void setDiscountRatePercent(double value);

	/**
	 * Returns the value of the '<em><b>Discount Rate Basis</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Which rule or guidance the discount rate follows, in words (stated in every estimate priced from this book).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Discount Rate Basis</em>' attribute.
	 * @see #setDiscountRateBasis(String)
	 * @see eluvia.site.model.SitePackage#getPriceBook_DiscountRateBasis()
	 * @model
	 * @generated
	 */
	String getDiscountRateBasis();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceBook#getDiscountRateBasis <em>Discount Rate Basis</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Discount Rate Basis</em>' attribute.
	 * @see #getDiscountRateBasis()
	 * @generated
	 */
	void setDiscountRateBasis(String value);

} // PriceBook
