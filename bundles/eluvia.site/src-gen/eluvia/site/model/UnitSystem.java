/**
 */
package eluvia.site.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Unit System</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * The units shown to the user; storage is always SI.
 * <!-- end-model-doc -->
 * @see eluvia.site.model.SitePackage#getUnitSystem()
 * @model
 * @generated
 */
public enum UnitSystem implements Enumerator {
	/**
	 * The '<em><b>SI</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * SI units (m, m3, kg, m/d).
	 * <!-- end-model-doc -->
	 * @see #SI_VALUE
	 * @generated
	 * @ordered
	 */
	SI(0, "SI", "SI"),

	/**
	 * The '<em><b>US CUSTOMARY</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * US customary units (ft, yd3, US ton, US gal, ft/d).
	 * <!-- end-model-doc -->
	 * @see #US_CUSTOMARY_VALUE
	 * @generated
	 * @ordered
	 */
	US_CUSTOMARY(1, "US_CUSTOMARY", "US_CUSTOMARY");

	/**
	 * The '<em><b>SI</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * SI units (m, m3, kg, m/d).
	 * <!-- end-model-doc -->
	 * @see #SI
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int SI_VALUE = 0;

	/**
	 * The '<em><b>US CUSTOMARY</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * US customary units (ft, yd3, US ton, US gal, ft/d).
	 * <!-- end-model-doc -->
	 * @see #US_CUSTOMARY
	 * @model
	 * @generated
	 * @ordered
	 */
	public static final int US_CUSTOMARY_VALUE = 1;

	/**
	 * An array of all the '<em><b>Unit System</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final UnitSystem[] VALUES_ARRAY =
		new UnitSystem[] {
			SI,
			US_CUSTOMARY,
		};

	/**
	 * A public read-only list of all the '<em><b>Unit System</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<UnitSystem> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Unit System</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static UnitSystem get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			UnitSystem result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Unit System</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static UnitSystem getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			UnitSystem result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Unit System</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static UnitSystem get(int value) {
		switch (value) {
			case SI_VALUE: return SI;
			case US_CUSTOMARY_VALUE: return US_CUSTOMARY;
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
	private UnitSystem(int value, String name, String literal) {
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
	
} //UnitSystem
