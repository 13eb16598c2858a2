/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Variogram Shape Kind</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The shape of a variogram structure (Isaaks and Srivastava 1989, ch. 16).
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getVariogramShapeKind()
 * @model
 * @generated
 */
public enum VariogramShapeKind implements Enumerator {
	/**
	 * The '<em><b>SPHERICAL</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Spherical.
	 * <!-- end-model-doc -->
	 * @see #SPHERICAL_VALUE
	 * @generated
	 * @ordered
	 */
	SPHERICAL(0, "SPHERICAL", "SPHERICAL"),

	/**
	 * The '<em><b>EXPONENTIAL</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Exponential (practical range).
	 * <!-- end-model-doc -->
	 * @see #EXPONENTIAL_VALUE
	 * @generated
	 * @ordered
	 */
	EXPONENTIAL(1, "EXPONENTIAL", "EXPONENTIAL"),

	/**
	 * The '<em><b>GAUSSIAN</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Gaussian (practical range).
	 * <!-- end-model-doc -->
	 * @see #GAUSSIAN_VALUE
	 * @generated
	 * @ordered
	 */
	GAUSSIAN(2, "GAUSSIAN", "GAUSSIAN");

	/**
	 * The '<em><b>SPHERICAL</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Spherical.
	 * <!-- end-model-doc -->
	 * @see #SPHERICAL
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int SPHERICAL_VALUE = 0;

	/**
	 * The '<em><b>EXPONENTIAL</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Exponential (practical range).
	 * <!-- end-model-doc -->
	 * @see #EXPONENTIAL
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int EXPONENTIAL_VALUE = 1;

	/**
	 * The '<em><b>GAUSSIAN</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Gaussian (practical range).
	 * <!-- end-model-doc -->
	 * @see #GAUSSIAN
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int GAUSSIAN_VALUE = 2;

	/**
	 * An array of all the '<em><b>Variogram Shape Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final VariogramShapeKind[] VALUES_ARRAY =
		new VariogramShapeKind[] {
			SPHERICAL,
			EXPONENTIAL,
			GAUSSIAN,
		};

	/**
	 * A public read-only list of all the '<em><b>Variogram Shape Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<VariogramShapeKind> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Variogram Shape Kind</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static VariogramShapeKind get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			VariogramShapeKind result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Variogram Shape Kind</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static VariogramShapeKind getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			VariogramShapeKind result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Variogram Shape Kind</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static VariogramShapeKind get(int value) {
		switch (value) {
			case SPHERICAL_VALUE: return SPHERICAL;
			case EXPONENTIAL_VALUE: return EXPONENTIAL;
			case GAUSSIAN_VALUE: return GAUSSIAN;
		}
		return null;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final int value;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String name;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String literal;

	/**
	 * Only this class can construct instances.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private VariogramShapeKind(int value, String name, String literal) {
		this.value = value;
		this.name = name;
		this.literal = literal;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getValue() {
	  return value;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
	  return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getLiteral() {
	  return literal;
	}

	/**
	 * Returns the literal value of the enumerator, which is its string representation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		return literal;
	}
	
} //VariogramShapeKind
