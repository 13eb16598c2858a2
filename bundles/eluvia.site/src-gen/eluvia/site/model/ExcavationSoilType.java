/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Excavation Soil Type</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * Soil and rock classes for excavation side slopes (US OSHA 29 CFR 1926 Subpart P, App. A).
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getExcavationSoilType()
 * @model
 * @generated
 */
public enum ExcavationSoilType implements Enumerator {
	/**
	 * The '<em><b>TYPE C</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Type C soil: maximum slope 1.5 H : 1 V (App. B Table B-1).
	 * <!-- end-model-doc -->
	 * @see #TYPE_C_VALUE
	 * @generated
	 * @ordered
	 */
	TYPE_C(0, "TYPE_C", "TYPE_C"),

	/**
	 * The '<em><b>TYPE B</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Type B soil: maximum slope 1 H : 1 V.
	 * <!-- end-model-doc -->
	 * @see #TYPE_B_VALUE
	 * @generated
	 * @ordered
	 */
	TYPE_B(1, "TYPE_B", "TYPE_B"),

	/**
	 * The '<em><b>TYPE A</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Type A soil: maximum slope 0.75 H : 1 V.
	 * <!-- end-model-doc -->
	 * @see #TYPE_A_VALUE
	 * @generated
	 * @ordered
	 */
	TYPE_A(2, "TYPE_A", "TYPE_A"),

	/**
	 * The '<em><b>STABLE ROCK</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Stable rock: vertical.
	 * <!-- end-model-doc -->
	 * @see #STABLE_ROCK_VALUE
	 * @generated
	 * @ordered
	 */
	STABLE_ROCK(3, "STABLE_ROCK", "STABLE_ROCK");

	/**
	 * The '<em><b>TYPE C</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Type C soil: maximum slope 1.5 H : 1 V (App. B Table B-1).
	 * <!-- end-model-doc -->
	 * @see #TYPE_C
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int TYPE_C_VALUE = 0;

	/**
	 * The '<em><b>TYPE B</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Type B soil: maximum slope 1 H : 1 V.
	 * <!-- end-model-doc -->
	 * @see #TYPE_B
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int TYPE_B_VALUE = 1;

	/**
	 * The '<em><b>TYPE A</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Type A soil: maximum slope 0.75 H : 1 V.
	 * <!-- end-model-doc -->
	 * @see #TYPE_A
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int TYPE_A_VALUE = 2;

	/**
	 * The '<em><b>STABLE ROCK</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Stable rock: vertical.
	 * <!-- end-model-doc -->
	 * @see #STABLE_ROCK
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int STABLE_ROCK_VALUE = 3;

	/**
	 * An array of all the '<em><b>Excavation Soil Type</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final ExcavationSoilType[] VALUES_ARRAY =
		new ExcavationSoilType[] {
			TYPE_C,
			TYPE_B,
			TYPE_A,
			STABLE_ROCK,
		};

	/**
	 * A public read-only list of all the '<em><b>Excavation Soil Type</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<ExcavationSoilType> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Excavation Soil Type</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ExcavationSoilType get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ExcavationSoilType result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Excavation Soil Type</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ExcavationSoilType getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ExcavationSoilType result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Excavation Soil Type</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ExcavationSoilType get(int value) {
		switch (value) {
			case TYPE_C_VALUE: return TYPE_C;
			case TYPE_B_VALUE: return TYPE_B;
			case TYPE_A_VALUE: return TYPE_A;
			case STABLE_ROCK_VALUE: return STABLE_ROCK;
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
	private ExcavationSoilType(int value, String name, String literal) {
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
	
} //ExcavationSoilType
