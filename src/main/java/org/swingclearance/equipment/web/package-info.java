/** Pages of the club inventory and the swing pattern library; controllers bind forms and call the services. */
package org.swingclearance.equipment.web;
