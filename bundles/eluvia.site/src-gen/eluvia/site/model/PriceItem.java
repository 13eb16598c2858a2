/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Price Item</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One unit rate of a price book.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.PriceItem#getCode <em>Code</em>}</li>
 *   <li>{@link eluvia.site.model.PriceItem#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.PriceItem#getUnit <em>Unit</em>}</li>
 *   <li>{@link eluvia.site.model.PriceItem#getRatePerUnit <em>Rate Per Unit</em>}</li>
 *   <li>{@link eluvia.site.model.PriceItem#getCurrency <em>Currency</em>}</li>
 *   <li>{@link eluvia.site.model.PriceItem#getSourceNote <em>Source Note</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getPriceItem()
 * @model
 * @generated
 */
public interface PriceItem extends EObject {
	/**
	 * Returns the value of the '<em><b>Code</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Short key by which cost estimates find the item, e.g. excavation.bank.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Code</em>' attribute.
	 * @see #setCode(String)
	 * @see eluvia.site.model.SitePackage#getPriceItem_Code()
	 * @model
	 * @generated
	 */
	String getCode();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceItem#getCode <em>Code</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Code</em>' attribute.
	 * @see #getCode()
	 * @generated
	 */
	void setCode(String value);

	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * What is priced.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see eluvia.site.model.SitePackage#getPriceItem_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceItem#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Unit of measure the rate is per, e.g. m3, t, d, each.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Unit</em>' attribute.
	 * @see #setUnit(String)
	 * @see eluvia.site.model.SitePackage#getPriceItem_Unit()
	 * @model
	 * @generated
	 */
	String getUnit();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceItem#getUnit <em>Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Unit</em>' attribute.
	 * @see #getUnit()
	 * @generated
	 */
	void setUnit(String value);

	/**
	 * Returns the value of the '<em><b>Rate Per Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Rate in the item's currency per one of its unit.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Rate Per Unit</em>' attribute.
	 * @see #setRatePerUnit(double)
	 * @see eluvia.site.model.SitePackage#getPriceItem_RatePerUnit()
	 * @model
	 * @generated
	 */
	double getRatePerUnit();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceItem#getRatePerUnit <em>Rate Per Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Rate Per Unit</em>' attribute.
	 * @see #getRatePerUnit()
	 * @generated
	 */
	void setRatePerUnit(double value);

	/**
	 * Returns the value of the '<em><b>Currency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Currency of the rate (ISO 4217); empty means the book's currency.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Currency</em>' attribute.
	 * @see #setCurrency(String)
	 * @see eluvia.site.model.SitePackage#getPriceItem_Currency()
	 * @model
	 * @generated
	 */
	String getCurrency();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceItem#getCurrency <em>Currency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Currency</em>' attribute.
	 * @see #getCurrency()
	 * @generated
	 */
	void setCurrency(String value);

	/**
	 * Returns the value of the '<em><b>Source Note</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Where this rate comes from.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Source Note</em>' attribute.
	 * @see #setSourceNote(String)
	 * @see eluvia.site.model.SitePackage#getPriceItem_SourceNote()
	 * @model
	 * @generated
	 */
	String getSourceNote();

	/**
	 * Sets the value of the '{@link eluvia.site.model.PriceItem#getSourceNote <em>Source Note</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Source Note</em>' attribute.
	 * @see #getSourceNote()
	 * @generated
	 */
	void setSourceNote(String value);

} // PriceItem
