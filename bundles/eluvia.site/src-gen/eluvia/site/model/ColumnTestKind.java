/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Column Test Kind</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * What a column test measured.
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getColumnTestKind()
 * @model
 * @generated
 */
public enum ColumnTestKind implements Enumerator {
	/**
	 * The '<em><b>BREAKTHROUGH</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * A clean column fed with contaminated water.
	 * <!-- end-model-doc -->
	 * @see #BREAKTHROUGH_VALUE
	 * @generated
	 * @ordered
	 */
	BREAKTHROUGH(0, "BREAKTHROUGH", "BREAKTHROUGH"),

	/**
	 * The '<em><b>ELUTION</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * A contaminated column flushed with clean water.
	 * <!-- end-model-doc -->
	 * @see #ELUTION_VALUE
	 * @generated
	 * @ordered
	 */
	ELUTION(1, "ELUTION", "ELUTION");

	/**
	 * The '<em><b>BREAKTHROUGH</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * A clean column fed with contaminated water.
	 * <!-- end-model-doc -->
	 * @see #BREAKTHROUGH
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int BREAKTHROUGH_VALUE = 0;

	/**
	 * The '<em><b>ELUTION</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * A contaminated column flushed with clean water.
	 * <!-- end-model-doc -->
	 * @see #ELUTION
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int ELUTION_VALUE = 1;

	/**
	 * An array of all the '<em><b>Column Test Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final ColumnTestKind[] VALUES_ARRAY =
		new ColumnTestKind[] {
			BREAKTHROUGH,
			ELUTION,
		};

	/**
	 * A public read-only list of all the '<em><b>Column Test Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<ColumnTestKind> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Column Test Kind</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ColumnTestKind get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ColumnTestKind result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Column Test Kind</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ColumnTestKind getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ColumnTestKind result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Column Test Kind</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ColumnTestKind get(int value) {
		switch (value) {
			case BREAKTHROUGH_VALUE: return BREAKTHROUGH;
			case ELUTION_VALUE: return ELUTION;
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
	private ColumnTestKind(int value, String name, String literal) {
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
	
} //ColumnTestKind
