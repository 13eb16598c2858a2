/**
 */
package eluvia.site.model;

import org.eclipse.emf.ecore.EObject;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Column Test Point</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One measured point of a column test.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.ColumnTestPoint#getPoreVolumes <em>Pore Volumes</em>}</li>
 *   <li>{@link eluvia.site.model.ColumnTestPoint#getRelativeConcentration <em>Relative Concentration</em>}</li>
 * </ul>
 *
 * @see eluvia.site.model.SitePackage#getColumnTestPoint()
 * @model
 * @generated
 */
public interface ColumnTestPoint extends EObject {
	/**
	 * Returns the value of the '<em><b>Pore Volumes</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Pore volumes passed, dimensionless.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Pore Volumes</em>' attribute.
	 * @see #setPoreVolumes(double)
	 * @see eluvia.site.model.SitePackage#getColumnTestPoint_PoreVolumes()
	 * @model
	 * @generated
	 */
	double getPoreVolumes();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ColumnTestPoint#getPoreVolumes <em>Pore Volumes</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Pore Volumes</em>' attribute.
	 * @see #getPoreVolumes()
	 * @generated
	 */
	void setPoreVolumes(double value);

	/**
	 * Returns the value of the '<em><b>Relative Concentration</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Effluent concentration over C0, dimensionless.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Relative Concentration</em>' attribute.
	 * @see #setRelativeConcentration(double)
	 * @see eluvia.site.model.SitePackage#getColumnTestPoint_RelativeConcentration()
	 * @model
	 * @generated
	 */
	double getRelativeConcentration();

	/**
	 * Sets the value of the '{@link eluvia.site.model.ColumnTestPoint#getRelativeConcentration <em>Relative Concentration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Relative Concentration</em>' attribute.
	 * @see #getRelativeConcentration()
	 * @generated
	 */
	void setRelativeConcentration(double value);

} // ColumnTestPoint
